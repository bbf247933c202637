import Papa from 'papaparse';

// Writing and reading CSV (RFC 4180) for the exports and imports. Every cell a person typed goes
// through `csvCell`, so a spreadsheet never runs a cell as a formula.

// OWASP, "CSV Injection" (community page, read 2024): a cell starting with =, +, - or @ is run as a
// formula by spreadsheet programs; tab and carriage return can start one too. A leading single
// quote makes the program show the text as it is.
const FORMULA_START = /^[=+\-@\t\r]/;

/** One cell: formula-like text gets a leading quote mark, then RFC 4180 quoting where needed. */
export function csvCell(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const safe = FORMULA_START.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** A whole file: a header row and data rows, CRLF line ends as RFC 4180 has them. */
export function toCsv(header: readonly string[], rows: readonly (readonly (string | number | null | undefined)[])[]): string {
  return [header, ...rows].map((row) => row.map(csvCell).join(',')).join('\r\n') + '\r\n';
}

/** Undoes `csvCell`'s guard on the way back in, so an export imports as it went out. */
export function unguardCell(value: string): string {
  return /^'[=+\-@\t\r]/.test(value) ? value.slice(1) : value;
}

export interface CsvRows {
  header: string[];
  /** Data rows with the line each came from (the header is line 1). Blank lines are skipped. */
  rows: { line: number; cells: string[] }[];
}

/** Reads CSV text with a header row; the delimiter is guessed (comma, semicolon or tab). */
export function readCsv(text: string): CsvRows {
  const clean = text.replace(/^\uFEFF/, '');
  // Guess the delimiter on the first rows without blank lines (they upset the guess), then read every
  // line with it so each row keeps its line number.
  const { delimiter } = Papa.parse<string[]>(clean, { delimitersToGuess: [',', ';', '\t'], skipEmptyLines: true, preview: 20 }).meta;
  const parsed = Papa.parse<string[]>(clean, { delimiter, skipEmptyLines: false });
  const lines = parsed.data
    .map((cells, i) => ({ line: i + 1, cells: cells.map((c) => unguardCell(c.trim())) }))
    .filter((l) => l.cells.some((c) => c !== ''));
  const [first, ...rest] = lines;
  return { header: first?.cells ?? [], rows: rest };
}
