// A small CSV reader and writer after RFC 4180, plus the spreadsheet
// formula-injection escape. No library: papaparse is not installed and the
// format is small enough to own (and test) here.

/** A record and its number as a spreadsheet shows it: the header is row 1, blank lines count. */
export type CsvRecord = { row: number; cells: string[] };

/** Raised for text that is not CSV at all, e.g. a quoted field that never closes. */
export class CsvSyntaxError extends Error {
  readonly row: number;

  constructor(row: number, message: string) {
    super(message);
    this.name = 'CsvSyntaxError';
    this.row = row;
  }
}

/**
 * Parses CSV text into records. RFC 4180 with the leniencies real files
 * need: LF or CR line ends as well as CRLF, a UTF-8 byte-order mark, a quote
 * inside an unquoted field taken literally, no line end after the last
 * record. Blank lines are skipped but still counted in `row`.
 * @throws CsvSyntaxError for a quoted field that is not closed or is followed by stray text
 */
export function parseCsv(text: string): CsvRecord[] {
  const src = text.startsWith('\uFEFF') ? text.slice(1) : text;
  const records: CsvRecord[] = [];
  let cells: string[] = [];
  let cell = '';
  let row = 1;
  let i = 0;
  let recordHasContent = false;

  const endCell = () => {
    cells.push(cell);
    cell = '';
  };
  const endRecord = () => {
    endCell();
    if (recordHasContent || cells.length > 1) records.push({ row, cells });
    cells = [];
    recordHasContent = false;
    row += 1;
  };

  while (i < src.length) {
    const ch = src[i];
    if (ch === '"' && cell === '') {
      // A quoted field (a quote opens one only at the start of a field): it
      // runs to the next lone quote, and "" is a literal quote.
      const startRow = row;
      i += 1;
      for (;;) {
        if (i >= src.length) throw new CsvSyntaxError(startRow, `Row ${startRow}: a quoted field is never closed`);
        const q = src[i];
        if (q === '"') {
          if (src[i + 1] === '"') {
            cell += '"';
            i += 2;
            continue;
          }
          i += 1;
          break;
        }
        // Line ends inside quotes belong to the field; a spreadsheet shows
        // the whole record as one row, so `row` does not move.
        cell += q;
        i += 1;
      }
      recordHasContent = true;
      const next = src[i];
      if (i < src.length && next !== ',' && next !== '\r' && next !== '\n') {
        throw new CsvSyntaxError(startRow, `Row ${startRow}: text after a closing quote; double a quote inside a quoted field ("")`);
      }
      continue;
    }
    if (ch === ',') {
      endCell();
      i += 1;
      continue;
    }
    if (ch === '\r' || ch === '\n') {
      endRecord();
      i += ch === '\r' && src[i + 1] === '\n' ? 2 : 1;
      continue;
    }
    cell += ch;
    recordHasContent = true;
    i += 1;
  }
  if (cell !== '' || cells.length > 0 || recordHasContent) endRecord();
  return records;
}

/** Characters that make a spreadsheet read a cell as a formula (OWASP "CSV Injection"). */
const FORMULA_TRIGGERS = new Set(['=', '+', '-', '@', '\t', '\r']);

function needsFormulaEscape(text: string): boolean {
  if (text === '') return false;
  if (FORMULA_TRIGGERS.has(text[0])) return true;
  // An apostrophe before a trigger is escaped too, so unescaping is exact.
  return text[0] === "'" && needsFormulaEscape(text.slice(1));
}

/**
 * Prefixes text that a spreadsheet would run as a formula with an
 * apostrophe, which spreadsheets show as text. Numbers are written as
 * numbers and never pass through here, so "-5" stays a number.
 */
export function escapeFormula(text: string): string {
  return needsFormulaEscape(text) ? `'${text}` : text;
}

/** Undoes escapeFormula exactly; other text is returned as it is. */
export function unescapeFormula(text: string): string {
  return text.startsWith("'") && needsFormulaEscape(text.slice(1)) ? text.slice(1) : text;
}

/** One value as CSV text: numbers as plain decimals, booleans as true/false, null as empty, text escaped. */
export function csvValue(value: string | number | boolean | null | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  return escapeFormula(value);
}

/** Quotes a field when RFC 4180 requires it (comma, quote, line end) or when edge spaces would be lost. */
export function quoteField(field: string): string {
  return /[",\r\n]|^\s|\s$/.test(field) ? `"${field.replaceAll('"', '""')}"` : field;
}

/** Records to CSV text with CRLF line ends, as RFC 4180 writes them. */
export function formatCsv(records: readonly (readonly string[])[]): string {
  return records.map((r) => r.map(quoteField).join(',')).join('\r\n') + '\r\n';
}
