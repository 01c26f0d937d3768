import { describe, expect, it } from 'vitest';
import { csvCell, csvLine, parseCsv } from './csv';

describe('csvCell / csvLine (RFC 4180)', () => {
  it('quotes commas, quotes, line breaks and edge spaces, and doubles quotes', () => {
    expect(csvCell('plain')).toBe('plain');
    expect(csvCell('a, b')).toBe('"a, b"');
    expect(csvCell('the "big" one')).toBe('"the ""big"" one"');
    expect(csvCell('two\nlines')).toBe('"two\nlines"');
    expect(csvCell(' padded')).toBe('" padded"');
    expect(csvCell(null)).toBe('');
    expect(csvCell(-12.5)).toBe('-12.5');
    expect(csvLine(['Q-1', 'a,b', 3])).toBe('Q-1,"a,b",3\r\n');
  });

  it('defuses text a spreadsheet would run as a formula, not negative numbers', () => {
    expect(csvCell('=HYPERLINK("x")')).toBe('"\'=HYPERLINK(""x"")"');
    expect(csvCell('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(csvCell('-12')).toBe('-12');
    expect(csvCell('+1 555')).toBe("'+1 555");
  });
});

describe('parseCsv', () => {
  it('reads back what csvLine writes, with the line each record starts on', () => {
    const text = '\uFEFF' + csvLine(['a', 'b']) + csvLine(['x, y', 'say "hi"']) + '\r\n' + csvLine(['two\nlines', '']);
    expect(parseCsv(text)).toEqual([
      { line: 1, cells: ['a', 'b'] },
      { line: 2, cells: ['x, y', 'say "hi"'] },
      { line: 4, cells: ['two\nlines', ''] },
    ]);
  });

  it('takes semicolons when the header uses them, LF endings and no final line break', () => {
    expect(parseCsv('a;b\n1,5;2')).toEqual([
      { line: 1, cells: ['a', 'b'] },
      { line: 2, cells: ['1,5', '2'] },
    ]);
  });

  it('names the line of an unclosed quote', () => {
    expect(() => parseCsv('a,b\n"open,1\n')).toThrow('Line 2');
  });
});
