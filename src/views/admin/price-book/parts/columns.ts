/** A column of an editable price-book table: which field, its heading, and how it is edited. */
export interface Column {
  key: string;
  title: string;
  kind: 'text' | 'number' | 'money' | 'select';
  options?: string[];
  /** words for a select's options (a material's name for its id) */
  optionLabel?: (value: string) => string;
  width?: number;
}
