import Papa from 'papaparse';
import {
  READING_LIMIT_C, roundTemperature, toCelsius,
  type ColumnMapping, type DateOrder, type TemperatureUnit,
} from '../schemas/readings';
import { validationFailed } from './errors';

// Reading a file of daily temperatures: is it CSV text at all, which column holds what, and is each
// row a day we can store. Pure functions: the upload service adds the database and the transaction.

export interface CsvTable {
  header: string[];
  /** Data rows as cells; rowNumbers[i] is the line in the file (header = 1) for rows[i]. */
  rows: string[][];
  rowNumbers: number[];
  hasHeader: boolean;
  delimiter: string;
}

const fileIssue = (message: string) => validationFailed([{ path: 'file', message }], message);

// Signatures of files people pick by mistake: a spreadsheet workbook is the usual one.
const signatures: { bytes: number[]; what: string }[] = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], what: 'a spreadsheet workbook (.xlsx) or a zip file' },
  { bytes: [0xd0, 0xcf, 0x11, 0xe0], what: 'an old-style spreadsheet workbook (.xls)' },
  { bytes: [0x25, 0x50, 0x44, 0x46], what: 'a PDF' },
  { bytes: [0x89, 0x50, 0x4e, 0x47], what: 'a PNG picture' },
  { bytes: [0xff, 0xd8, 0xff], what: 'a JPEG picture' },
  { bytes: [0x47, 0x49, 0x46, 0x38], what: 'a GIF picture' },
];
const SAVE_AS_CSV = 'Save it as CSV (comma-separated values) from your spreadsheet and upload that file.';

/** The file as text, or a 400 saying why it is not a CSV file. UTF-8, UTF-16 (with its mark) and Windows-1252 are read. */
export function decodeCsvText(buffer: Buffer): string {
  if (buffer.length === 0) throw fileIssue('The file is empty.');
  const known = signatures.find((s) => s.bytes.every((b, i) => buffer[i] === b));
  if (known) throw fileIssue(`This file is ${known.what}, not CSV. ${SAVE_AS_CSV}`);
  let text: string;
  if (buffer[0] === 0xff && buffer[1] === 0xfe) text = new TextDecoder('utf-16le').decode(buffer.subarray(2));
  else if (buffer.subarray(0, 65_536).includes(0)) throw fileIssue(`This is not a text file, so it cannot be CSV. ${SAVE_AS_CSV}`);
  else {
    try {
      text = new TextDecoder('utf-8', { fatal: true }).decode(buffer);
    } catch {
      // Spreadsheets on Windows often save "°C" in the old Windows code page rather than UTF-8.
      text = new TextDecoder('windows-1252').decode(buffer);
    }
  }
  text = text.replace(/^\uFEFF/, '');
  if (/[\u0000-\u0008\u000E-\u001F]/.test(text.slice(0, 65_536))) throw fileIssue(`This does not look like a text file. ${SAVE_AS_CSV}`);
  return text;
}

const isBlank = (cells: string[]) => cells.every((c) => c.trim() === '');

export function parseTable(text: string): CsvTable {
  const parsed = Papa.parse<string[]>(text, { delimitersToGuess: [',', ';', '\t', '|'], skipEmptyLines: false });
  const lines = parsed.data.map((cells, i) => ({ cells: cells.map((c) => c.trim()), line: i + 1 })).filter((l) => !isBlank(l.cells));
  const first = lines[0];
  if (!first) throw fileIssue('The file has no rows.');
  if (first.cells.length < 3) throw fileIssue(`This does not look like a CSV file of readings: its first row has ${first.cells.length === 1 ? 'one column' : 'two columns'}. A readings file needs at least a date, a minimum and a maximum, separated by commas.`);
  // A first row with a date or a number in it is data, not a header.
  const hasHeader = !first.cells.some((c) => parseDateCell(c, 'dmy') !== null || parseNumber(c, ',') !== null);
  const data = hasHeader ? lines.slice(1) : lines;
  if (data.length === 0) throw fileIssue('The file has a header row but no readings under it.');
  return {
    header: hasHeader ? first.cells : first.cells.map((_, i) => `Column ${i + 1}`),
    rows: data.map((l) => l.cells),
    rowNumbers: data.map((l) => l.line),
    hasHeader,
    delimiter: parsed.meta.delimiter,
  };
}

// ---- Which column is which ----

const unitWords = new Set(['c', 'f', 'celsius', 'fahrenheit', 'mm', 'in', 'inch', 'inches', 'temp', 'temperature', 'air', 'daily', 'deg', 'degree', 'degrees', 'of', 'the', 'obs', 'observed', 'value', 'screen', 'm']);
const namesFor: Record<keyof ColumnMapping, string[]> = {
  date: ['date', 'day', 'datetime', 'observationdate', 'obsdate', 'when', 'timestamp', 'time', 'dateutc', 'localdate'],
  tmin: ['tmin', 'min', 'minimum', 'low', 'lowest', 'tn', 'mintemp', 'lo', 'mn', 'minc', 'minf', 'night'],
  tmax: ['tmax', 'max', 'maximum', 'high', 'highest', 'tx', 'maxtemp', 'hi', 'mx', 'maxc', 'maxf'],
  rain: ['rain', 'rainfall', 'precip', 'precipitation', 'prcp', 'rr', 'raintotal', 'totalrain', 'precipitationtotal', 'rainmm'],
};

/** "Min temp (°C)", "TMIN_C" and "minimum" all become "min…"-style keys we can look up. */
export function headerKey(name: string): string {
  const words = name.toLowerCase().replace(/\(.*?\)|\[.*?\]/g, ' ').replace(/[°º]/g, ' ').split(/[^a-z0-9]+/).filter(Boolean);
  const kept = words.filter((w) => !unitWords.has(w));
  return (kept.length ? kept : words).join('');
}

export function detectMapping(header: string[]): { [K in keyof ColumnMapping]: number | null } {
  const keys = header.map(headerKey);
  const find = (field: keyof ColumnMapping) => {
    const i = keys.findIndex((k) => namesFor[field].includes(k));
    return i >= 0 ? i : null;
  };
  return { date: find('date'), tmin: find('tmin'), tmax: find('tmax'), rain: find('rain') };
}

const saysFahrenheit = (h: string) => /°\s*f\b|º\s*f\b|\(f\)|\[f\]|fahrenheit|deg\s*f\b|[_\s]f$/i.test(h);
const saysCelsius = (h: string) => /°\s*c\b|º\s*c\b|\(c\)|\[c\]|celsius|deg\s*c\b|[_\s]c$/i.test(h);

/** The unit the file is in: what the header says, or failing that what the values suggest. */
export function detectUnit(table: CsvTable, mapping: { tmin: number | null; tmax: number | null }): { unit: TemperatureUnit; note: string } {
  const headers = [mapping.tmin, mapping.tmax].flatMap((i) => (i === null ? [] : [table.header[i] ?? '']));
  if (headers.some(saysFahrenheit)) return { unit: 'F', note: 'The column names say °F.' };
  if (headers.some(saysCelsius)) return { unit: 'C', note: 'The column names say °C.' };
  const highs = mapping.tmax === null ? [] : table.rows.map((r) => parseNumber(r[mapping.tmax!] ?? '', table.delimiter)).filter((v): v is number => v !== null);
  // Daily highs above 45 °C are almost unknown where fruit is grown, while in °F they are an ordinary
  // summer day: our own rule of thumb, no single source. The preview says so and the person can change it.
  if (highs.some((v) => v > 45)) return { unit: 'F', note: 'No unit in the column names; maximums above 45 suggest °F.' };
  return { unit: 'C', note: 'No unit in the column names; the values look like °C.' };
}

export const rainIsInInches = (header: string) => /\(in\)|\binch|\bin\b\s*$|_in$/i.test(header);

// ---- Dates ----

const MONTHS = ['jan', 'feb', 'mar', 'apr', 'may', 'jun', 'jul', 'aug', 'sep', 'oct', 'nov', 'dec'];
type Order = Exclude<DateOrder, 'auto'>;

function isoOf(y: number, m: number, d: number): string | null {
  if (y < 1900 || y > 2200 || m < 1 || m > 12 || d < 1) return null;
  const date = new Date(Date.UTC(y, m - 1, d));
  if (date.getUTCMonth() !== m - 1) return null;
  return `${String(y).padStart(4, '0')}-${String(m).padStart(2, '0')}-${String(d).padStart(2, '0')}`;
}

const monthNumber = (word: string) => MONTHS.indexOf(word.slice(0, 3).toLowerCase()) + 1;

/** A date cell as YYYY-MM-DD, or null. `order` settles 03/04/2025; a time after the date is ignored. */
export function parseDateCell(cell: string, order: Order): string | null {
  const text = cell.trim().replace(/[T ]\d{1,2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?$/, '');
  let m = /^(\d{4})[-/.](\d{1,2})[-/.](\d{1,2})$/.exec(text) ?? /^(\d{4})(\d{2})(\d{2})$/.exec(text);
  if (m) return isoOf(Number(m[1]), Number(m[2]), Number(m[3]));
  m = /^(\d{1,2})[-/.](\d{1,2})[-/.](\d{4})$/.exec(text);
  if (m) return order === 'mdy' ? isoOf(Number(m[3]), Number(m[1]), Number(m[2])) : isoOf(Number(m[3]), Number(m[2]), Number(m[1]));
  m = /^(\d{1,2})[-\s/]([A-Za-z]{3,9})[-\s/,]+(\d{4})$/.exec(text);
  if (m && monthNumber(m[2]!) > 0) return isoOf(Number(m[3]), monthNumber(m[2]!), Number(m[1]));
  m = /^([A-Za-z]{3,9})[-\s/]+(\d{1,2}),?[-\s/]+(\d{4})$/.exec(text);
  if (m && monthNumber(m[1]!) > 0) return isoOf(Number(m[3]), monthNumber(m[1]!), Number(m[2]));
  return null;
}

/** Day-first or month-first, from the file's own dates: a first number above 12 settles it. */
export function detectDateOrder(cells: string[]): { order: Order; note: string } {
  let dayFirst = false;
  let monthFirst = false;
  let isSlashed = false;
  for (const cell of cells) {
    const m = /^(\d{1,2})[-/.](\d{1,2})[-/.]\d{4}/.exec(cell.trim());
    if (!m) continue;
    isSlashed = true;
    if (Number(m[1]) > 12) dayFirst = true;
    if (Number(m[2]) > 12) monthFirst = true;
  }
  if (!isSlashed) return { order: 'ymd', note: 'Dates are read as written (year first or with the month in words).' };
  if (monthFirst && !dayFirst) return { order: 'mdy', note: 'Dates are read month first (e.g. 04/13/2025), as the file writes them.' };
  if (dayFirst) return { order: 'dmy', note: 'Dates are read day first (e.g. 13/04/2025), as the file writes them.' };
  return { order: 'dmy', note: 'Dates such as 03/04/2025 could be either way round; they are read day first. Change it if your file puts the month first.' };
}

// ---- Numbers and rows ----

/** A number cell, allowing a decimal comma when commas do not separate the columns, a "−" and a trailing unit. */
export function parseNumber(cell: string, delimiter: string): number | null {
  let text = cell.trim().replace(/\s*(°|º)?\s*[CFcf]$/, '').replace(/^\u2212/, '-').replace(/\s*mm$/i, '');
  if (delimiter !== ',') text = text.replace(',', '.');
  if (!/^[-+]?(\d+(\.\d*)?|\.\d+)$/.test(text)) return null;
  return Number(text);
}

export interface ReadRow {
  row: number;
  date: string | null;
  tminC: number | null;
  tmaxC: number | null;
  rainMm: number | null;
  errors: string[];
}

export interface ReadOptions {
  mapping: ColumnMapping;
  unit: TemperatureUnit;
  order: Order;
  /** Today at the site: later dates are refused. */
  today: string;
}

function readTemperature(cell: string | undefined, what: string, o: ReadOptions, delimiter: string, errors: string[]): number | null {
  if (!cell) return errors.push(`The ${what} is empty`), null;
  const value = parseNumber(cell, delimiter);
  if (value === null) return errors.push(`The ${what} "${cell}" is not a number`), null;
  const c = toCelsius(value, o.unit);
  if (Math.abs(c) > READING_LIMIT_C) return errors.push(`The ${what} ${value} °${o.unit} is outside −60…60 °C`), null;
  return roundTemperature(c);
}

function readRain(cell: string | undefined, factor: number, delimiter: string, errors: string[]): number | null {
  if (!cell) return null;
  const value = parseNumber(cell, delimiter);
  if (value === null || value < 0) return errors.push(`The rain "${cell}" is not a number of 0 or more`), null;
  return Math.round(value * factor * 10) / 10;
}

const asWritten = (cell: string | undefined, table: CsvTable) => parseNumber(cell ?? '', table.delimiter);

/** Every row checked on its own, then dates seen twice; each row keeps its line number. */
export function readRows(table: CsvTable, o: ReadOptions): ReadRow[] {
  const seen = new Map<string, number>();
  const rainFactor = o.mapping.rain !== null && rainIsInInches(table.header[o.mapping.rain] ?? '') ? 25.4 : 1;
  return table.rows.map((cells, i) => {
    const row = table.rowNumbers[i] as number;
    const errors: string[] = [];
    const dateCell = cells[o.mapping.date] ?? '';
    const date = parseDateCell(dateCell, o.order);
    if (!date) errors.push(dateCell ? `The date "${dateCell}" could not be read` : 'The date is empty');
    else if (date > o.today) errors.push(`${date} is after today`);
    const tminC = readTemperature(cells[o.mapping.tmin], 'minimum', o, table.delimiter, errors);
    const tmaxC = readTemperature(cells[o.mapping.tmax], 'maximum', o, table.delimiter, errors);
    // Said in the file's own unit, so the grower recognises the numbers in their spreadsheet.
    if (tminC !== null && tmaxC !== null && tminC > tmaxC) errors.push(`The minimum (${asWritten(cells[o.mapping.tmin], table)} °${o.unit}) is above the maximum (${asWritten(cells[o.mapping.tmax], table)} °${o.unit})`);
    const rainMm = o.mapping.rain === null ? null : readRain(cells[o.mapping.rain], rainFactor, table.delimiter, errors);
    if (date) {
      const earlier = seen.get(date);
      if (earlier !== undefined) errors.push(`${date} is also on row ${earlier}`);
      else seen.set(date, row);
    }
    return { row, date, tminC, tmaxC, rainMm, errors };
  });
}
