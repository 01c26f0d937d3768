/**
 * The price book's tables as CSV (issue 12): their columns for export, and the tube table read back
 * from a file with each problem named by line and column, then compared with the book's tubes
 * (added, changed, removed) for the admin to confirm before it is saved as a new version.
 */
import { csvLine, parseCsv, type CsvValue } from './csv';
import { minorDigits } from './format';
import type { PriceBook } from './schemas/price-book';
import { TUBE_MATERIALS } from './thermal/geometry/materials';

export const priceBookTables = ['tubes', 'plate', 'shellPipe', 'heads', 'nozzles', 'quantityBreaks'] as const;
export type PriceBookTable = (typeof priceBookTables)[number];

interface CsvColumn {
  key: string;
  title: string;
  kind: 'text' | 'number' | 'money' | 'material';
}

/** Columns of each table; money columns are in the book's currency, major units ("12.40"). */
export const PRICE_BOOK_CSV_COLUMNS: Record<PriceBookTable, CsvColumn[]> = {
  tubes: [
    { key: 'material', title: 'Material', kind: 'material' },
    { key: 'od', title: 'OD', kind: 'text' },
    { key: 'wall', title: 'Wall', kind: 'text' },
    { key: 'perMetre_minor', title: 'Per metre', kind: 'money' },
  ],
  plate: [
    { key: 'material', title: 'Material', kind: 'material' },
    { key: 'perKg_minor', title: 'Per kg', kind: 'money' },
  ],
  shellPipe: [
    { key: 'label', title: 'Pipe', kind: 'text' },
    { key: 'perMetre_minor', title: 'Per metre', kind: 'money' },
  ],
  heads: [
    { key: 'maxShellDiameter_m', title: 'Shell ID up to (m)', kind: 'number' },
    { key: 'perPair_minor', title: 'Per pair', kind: 'money' },
  ],
  nozzles: [
    { key: 'maxNps', title: 'Up to NPS', kind: 'number' },
    { key: 'rating', title: 'Class', kind: 'text' },
    { key: 'each_minor', title: 'Each', kind: 'money' },
  ],
  quantityBreaks: [
    { key: 'minQuantity', title: 'From units', kind: 'number' },
    { key: 'discount_pct', title: 'Discount (%)', kind: 'number' },
  ],
};

const heading = (c: CsvColumn, currency: string) => (c.kind === 'money' ? `${c.title} (${currency})` : c.title);

/** A material's name ("Carbon steel") for its id; the id itself when unknown. */
export const materialWord = (id: string) => TUBE_MATERIALS.find((m) => m.id === id)?.name ?? id;

/** One table of `book` as CSV text (header first, CRLF lines). */
export function priceBookTableCsv(book: PriceBook, table: PriceBookTable): string {
  const columns = PRICE_BOOK_CSV_COLUMNS[table];
  const digits = minorDigits(book.currency);
  const rows = (book[table] as Record<string, unknown>[]).map((row) =>
    columns.map((c): CsvValue => {
      const v = row[c.key];
      if (c.kind === 'money') return ((v as number) / 10 ** digits).toFixed(digits);
      if (c.kind === 'material') return materialWord(String(v));
      return v as CsvValue;
    }),
  );
  return [columns.map((c) => heading(c, book.currency)), ...rows].map(csvLine).join('');
}

export type TubeRow = PriceBook['tubes'][number];

export interface CsvProblem {
  /** line of the file (1 = the header) */
  line: number;
  /** the column's heading, or null for a problem of the whole line */
  column: string | null;
  message: string;
}

export interface TubeImportPreview {
  /** the tube table as the file has it (empty when the file has problems) */
  tubes: TubeRow[];
  added: TubeRow[];
  changed: { before: TubeRow; after: TubeRow }[];
  removed: TubeRow[];
  unchanged: number;
  problems: CsvProblem[];
}

/** At most this many tube rows in one file. */
export const MAX_TUBE_ROWS = 2000;

const tubeKey = (t: Pick<TubeRow, 'material' | 'od' | 'wall'>) => `${t.material}|${t.od.toLowerCase()}|${t.wall.toLowerCase()}`;

function materialId(text: string): string | undefined {
  const t = text.trim().toLowerCase();
  return TUBE_MATERIALS.find((m) => m.id === t || m.name.toLowerCase() === t || m.name.toLowerCase().startsWith(`${t} (`))?.id;
}

/** Reads a tube table from CSV text and compares it with `book`'s tubes. */
export function previewTubeImport(text: string, book: PriceBook): TubeImportPreview {
  const problems: CsvProblem[] = [];
  const result = (tubes: TubeRow[]): TubeImportPreview => {
    if (problems.length) return { tubes: [], added: [], changed: [], removed: [], unchanged: 0, problems };
    const old = new Map(book.tubes.map((t) => [tubeKey(t), t]));
    const now = new Set(tubes.map(tubeKey));
    const added: TubeRow[] = [];
    const changed: { before: TubeRow; after: TubeRow }[] = [];
    let unchanged = 0;
    for (const t of tubes) {
      const before = old.get(tubeKey(t));
      if (!before) added.push(t);
      else if (before.perMetre_minor !== t.perMetre_minor || before.od !== t.od || before.wall !== t.wall) changed.push({ before, after: t });
      else unchanged++;
    }
    return { tubes, added, changed, removed: book.tubes.filter((t) => !now.has(tubeKey(t))), unchanged, problems };
  };
  let records;
  try {
    records = parseCsv(text);
  } catch (e) {
    problems.push({ line: Number(/Line (\d+)/.exec((e as Error).message)?.[1] ?? 1), column: null, message: (e as Error).message.replace(/^Line \d+: /, '') });
    return result([]);
  }
  const [head, ...rows] = records;
  const columns = PRICE_BOOK_CSV_COLUMNS.tubes;
  const names = (head?.cells ?? []).map((c) => c.trim().toLowerCase().replace(/\s*\([^)]*\)\s*$/, ''));
  const at = columns.map((c) => names.indexOf(c.title.toLowerCase()));
  const missing = columns.filter((_, i) => at[i] === -1).map((c) => c.title);
  if (!head || missing.length) {
    problems.push({ line: 1, column: null, message: `The header must name the columns ${columns.map((c) => heading(c, book.currency)).join(', ')}; missing: ${missing.join(', ')}.` });
    return result([]);
  }
  const currency = /\(([A-Z]{3})\)/.exec(head.cells[at[3]!] ?? '')?.[1];
  if (currency && currency !== book.currency) problems.push({ line: 1, column: head.cells[at[3]!]!.trim(), message: `Prices are in ${currency}; the book is in ${book.currency}.` });
  if (rows.length === 0) problems.push({ line: 1, column: null, message: 'The file has no tube rows: the price book needs at least one.' });
  if (rows.length > MAX_TUBE_ROWS) problems.push({ line: 1, column: null, message: `The file has ${rows.length} rows; at most ${MAX_TUBE_ROWS} are read.` });
  const digits = minorDigits(book.currency);
  const seen = new Map<string, number>();
  const tubes: TubeRow[] = [];
  for (const { line, cells } of rows.slice(0, MAX_TUBE_ROWS)) {
    const cell = (i: number) => (cells[at[i]!] ?? '').trim();
    const bad = (i: number, message: string) => problems.push({ line, column: columns[i]!.title, message });
    const material = materialId(cell(0));
    if (!material) bad(0, cell(0) ? `“${cell(0)}” is not a tube material; use one of: ${TUBE_MATERIALS.map((m) => m.name).join(', ')}.` : 'Give the material.');
    const od = cell(1);
    const wall = cell(2);
    if (!od) bad(1, 'Give the outside diameter, e.g. 3/4 in or 20 mm.');
    else if (od.length > 40) bad(1, 'Use at most 40 characters.');
    if (!wall) bad(2, 'Give the wall, e.g. BWG 16 or 1.5 mm.');
    else if (wall.length > 40) bad(2, 'Use at most 40 characters.');
    const priceText = cell(3).replace(/^[^\d.-]+/, '').replace(/,(?=\d{3}(\D|$))/g, '');
    const price = Number(priceText);
    let perMetre_minor = 0;
    if (!cell(3)) bad(3, 'Give the price per metre.');
    else if (!/^\d+(\.\d+)?$/.test(priceText) || !Number.isFinite(price)) bad(3, `“${cell(3)}” is not a price; write e.g. 12.40.`);
    else if ((priceText.split('.')[1]?.length ?? 0) > digits) bad(3, `Use at most ${digits} decimals.`);
    else if (price > 1e7) bad(3, 'Use a price below 10,000,000.');
    else perMetre_minor = Math.round(price * 10 ** digits);
    if (material && od && wall) {
      const key = tubeKey({ material, od, wall });
      const first = seen.get(key);
      if (first !== undefined) problems.push({ line, column: null, message: `The same tube as on line ${first}.` });
      else seen.set(key, line);
    }
    if (material) tubes.push({ material, od, wall, perMetre_minor });
  }
  return result(tubes);
}
