import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { CsvSyntaxError, csvValue, escapeFormula, formatCsv, parseCsv, unescapeFormula } from './csv.ts';

const cells = (text: string) => parseCsv(text).map((r) => r.cells);

describe('parseCsv', () => {
  test.each([
    ['plain fields', 'a,b,c\r\n1,2,3\r\n', [['a', 'b', 'c'], ['1', '2', '3']]],
    ['LF line ends and no final line end', 'a,b\n1,2', [['a', 'b'], ['1', '2']]],
    ['lone CR line ends', 'a,b\r1,2\r', [['a', 'b'], ['1', '2']]],
    ['empty fields', ',a,,\r\n', [['', 'a', '', '']]],
    ['a quoted comma, quote and line break', '"x,y","say ""hi""","two\r\nlines"\r\n', [['x,y', 'say "hi"', 'two\r\nlines']]],
    ['a quoted empty field', '"",a\n', [['', 'a']]],
    ['a byte-order mark', '\uFEFFa,b\n', [['a', 'b']]],
    ['a quote inside an unquoted field, taken literally', 'say "hi",b\n', [['say "hi"', 'b']]],
  ])('when the text has %s, then the records come out as written', (_what, text, expected) => {
    expect(cells(text)).toEqual(expected);
  });

  test('when there are blank lines, then they are skipped but still counted in the row numbers', () => {
    const records = parseCsv('h1,h2\n\na,b\n"multi\nline",c\nd,e\n');

    expect(records).toEqual([
      { row: 1, cells: ['h1', 'h2'] },
      { row: 3, cells: ['a', 'b'] },
      { row: 4, cells: ['multi\nline', 'c'] },
      { row: 5, cells: ['d', 'e'] },
    ]);
  });

  test('when a quoted field never closes, then a CsvSyntaxError names the row it started on', () => {
    expect(() => parseCsv('a\nb\n"open,\nstill open')).toThrow(CsvSyntaxError);
    try {
      parseCsv('a\nb\n"open,\nstill open');
    } catch (error) {
      expect((error as CsvSyntaxError).row).toBe(3);
    }
  });

  test('when text follows a closing quote, then it is refused rather than guessed', () => {
    expect(() => parseCsv('"a"b,c\n')).toThrow(/text after a closing quote/);
  });
});

describe('formatCsv', () => {
  test('when fields hold commas, quotes, line breaks or edge spaces, then only those are quoted, with CRLF line ends', () => {
    expect(formatCsv([['a', 'b,c', 'say "hi"'], ['x\ny', ' pad', '']])).toBe('a,"b,c","say ""hi"""\r\n"x\ny"," pad",\r\n');
  });

  test('when any records are written and read back, then they are unchanged', () => {
    // Blank records are dropped on reading, so every generated record has a non-empty first cell.
    const record = fc.tuple(fc.string({ minLength: 1 }), fc.array(fc.string(), { maxLength: 5 })).map(([first, rest]) => [first, ...rest]);
    fc.assert(
      fc.property(fc.array(record, { minLength: 1, maxLength: 8 }), (records) => {
        expect(cells(formatCsv(records))).toEqual(records);
      }),
    );
  });
});

describe('escapeFormula', () => {
  test.each([
    ['=SUM(A1:A9)', "'=SUM(A1:A9)"],
    ['+44 1632 960000', "'+44 1632 960000"],
    ['-rf', "'-rf"],
    ['@cmd', "'@cmd"],
    ['\tindent', "'\tindent"],
    ["'=already", "''=already"],
    ["'quoted", "'quoted"],
    ['plain text', 'plain text'],
  ])('when a cell is %j, then it is written %j', (text, escaped) => {
    expect(escapeFormula(text)).toBe(escaped);
    expect(unescapeFormula(escaped)).toBe(text);
  });

  test('when any text is escaped and unescaped, then it comes back exactly', () => {
    fc.assert(fc.property(fc.string(), (text) => unescapeFormula(escapeFormula(text)) === text));
  });

  test('when a value is a number, then it is written as one and never escaped', () => {
    expect(csvValue(-5)).toBe('-5');
    expect(csvValue(0.1 + 0.2)).toBe(String(0.1 + 0.2));
    expect(csvValue(null)).toBe('');
    expect(csvValue(false)).toBe('false');
    expect(csvValue('-5 °C outside')).toBe("'-5 °C outside");
  });
});
