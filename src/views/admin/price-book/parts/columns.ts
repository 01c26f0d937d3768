/** A column of an editable price-book table: which field, its heading, and how it is edited. */
export interface Column {
  key: string;
  title: string;
  kind: 'text' | 'number' | 'money' | 'select';
  options?: string[];
  width?: number;
}
