/**
 * CSV as RFC 4180 writes it (comma, CRLF, a field quoted when it holds a comma, a quote, a line
 * break or edge spaces; quotes doubled), for the list exports and the price-book import. A text that
 * a spreadsheet would run as a formula (starting with =, +, -, @, tab or CR and not a number) gets a
 * leading apostrophe (OWASP, "CSV injection").
 */

export type CsvValue = string | number | boolean | null | undefined;

const FORMULA_START = /^[=+\-@\t\r]/;

/** One field, escaped. */
export function csvCell(value: CsvValue): string {
  if (value === null || value === undefined) return '';
  let text = String(value);
  if (typeof value === 'string' && FORMULA_START.test(text) && !Number.isFinite(Number(text))) text = `'${text}`;
  return /[",\r\n]|^\s|\s$/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** One record with its CRLF. */
export function csvLine(cells: readonly CsvValue[]): string {
  return `${cells.map(csvCell).join(',')}\r\n`;
}

/** A parsed record and the line of the file it starts on (1 = the header). */
export interface CsvRecord {
  line: number;
  cells: string[];
}

/**
 * Reads CSV text (comma or semicolon, the one the header uses; CRLF or LF; quoted fields with
 * doubled quotes and line breaks; a UTF-8 byte-order mark). Blank lines are skipped. Throws an
 * Error naming the line of an unclosed quote.
 */
export function parseCsv(text: string): CsvRecord[] {
  const src = text.replace(/^\uFEFF/, '');
  const firstLine = src.split(/\r?\n/, 1)[0] ?? '';
  const sep = (firstLine.match(/;/g)?.length ?? 0) > (firstLine.match(/,/g)?.length ?? 0) ? ';' : ',';
  const records: CsvRecord[] = [];
  let cells: string[] = [];
  let field = '';
  let quoted = false;
  let line = 1;
  let start = 1;
  let i = 0;
  const endRecord = () => {
    cells.push(field);
    if (cells.length > 1 || cells[0].trim() !== '') records.push({ line: start, cells });
    cells = [];
    field = '';
  };
  while (i < src.length) {
    const c = src[i];
    if (quoted) {
      if (c === '"' && src[i + 1] === '"') (field += '"'), (i += 2);
      else if (c === '"') (quoted = false), i++;
      else {
        if (c === '\n') line++;
        field += c;
        i++;
      }
      continue;
    }
    if (c === '"' && field.trim() === '') (quoted = true), (field = ''), i++;
    else if (c === sep) cells.push(field), (field = ''), i++;
    else if (c === '\r' && src[i + 1] === '\n') i++;
    else if (c === '\n' || c === '\r') endRecord(), line++, (start = line), i++;
    else (field += c), i++;
  }
  if (quoted) throw new Error(`Line ${start}: a quoted field is not closed.`);
  if (field !== '' || cells.length > 0) endRecord();
  return records;
}
