import { dailyTemperatureSchema, MAX_TOOL_DAYS, type DailyTemperatureInput } from '../../server/schemas/tools';

// Daily minimum and maximum temperatures from pasted or uploaded CSV. papaparse is not installed,
// and weather exports are plain enough (no quoted delimiters) that a small reader does the job.
// Every problem is reported against the line of the file it came from, so it can be found and fixed.

export interface RowError {
  /** 1-based line in the text; 0 for a problem with the file as a whole. */
  line: number;
  message: string;
}

export interface ParsedDays {
  days: DailyTemperatureInput[];
  /** The file line each of `days` came from, for mapping the server's `days.N` issues back. */
  lines: number[];
  errors: RowError[];
}

type Column = 'date' | 'tmin' | 'tmax';

// Header words growers' spreadsheets and weather stations commonly use, after lower-casing and
// dropping everything but letters (so "Min temp (°C)" reads as "mintempc").
const HEADER_PATTERNS: Record<Column, RegExp> = {
  date: /^(date|day|datum|obsdate|time)/,
  tmin: /^(tmin|tn|min|low|minimum|lowest)/,
  tmax: /^(tmax|tx|max|high|maximum|highest)/,
};

function detectDelimiter(line: string): string {
  if (line.includes('\t')) return '\t';
  return (line.match(/;/g)?.length ?? 0) > (line.match(/,/g)?.length ?? 0) ? ';' : ',';
}

const clean = (cell: string) => cell.trim().replace(/^"(.*)"$/, '$1').trim();

function headerColumns(cells: string[]): Partial<Record<Column, number>> | null {
  const found: Partial<Record<Column, number>> = {};
  cells.forEach((cell, i) => {
    const word = cell.toLowerCase().replace(/[^a-z]/g, '');
    for (const column of ['date', 'tmin', 'tmax'] as const) {
      if (found[column] === undefined && HEADER_PATTERNS[column].test(word)) {
        found[column] = i;
        return;
      }
    }
  });
  return Object.keys(found).length > 0 ? found : null;
}

/** ISO dates as they are; 31/12/2026, 31-12-2026 and 31.12.2026 read day first, the way UK exports write them. */
export function toIsoDate(text: string): string {
  const iso = /^(\d{4})[-/](\d{1,2})[-/](\d{1,2})$/.exec(text);
  if (iso) return `${iso[1]}-${iso[2]!.padStart(2, '0')}-${iso[3]!.padStart(2, '0')}`;
  const dayFirst = /^(\d{1,2})[/.-](\d{1,2})[/.-](\d{4})$/.exec(text);
  if (dayFirst) return `${dayFirst[3]}-${dayFirst[2]!.padStart(2, '0')}-${dayFirst[1]!.padStart(2, '0')}`;
  return text;
}

function toNumber(text: string, decimalComma: boolean): number | null {
  const value = decimalComma ? text.replace(',', '.') : text;
  if (value === '') return null;
  const n = Number(value);
  return Number.isFinite(n) ? n : Number.NaN;
}

const COLUMN_WORDS: Record<Column, string> = { date: 'date', tmin: 'minimum', tmax: 'maximum' };

export function parseDaysCsv(text: string): ParsedDays {
  const out: ParsedDays = { days: [], lines: [], errors: [] };
  const lines = text.split(/\r\n|\n|\r/).map((raw, i) => ({ raw, line: i + 1 })).filter((l) => l.raw.trim() !== '' && !l.raw.trim().startsWith('#'));
  if (lines.length === 0) return out;
  const delimiter = detectDelimiter(lines[0]!.raw);
  const decimalComma = delimiter !== ',';
  const header = headerColumns(lines[0]!.raw.split(delimiter).map(clean));
  const columns: Record<Column, number | undefined> = header ? { date: header.date, tmin: header.tmin, tmax: header.tmax } : { date: 0, tmin: 1, tmax: 2 };
  const missing = (Object.keys(columns) as Column[]).filter((c) => columns[c] === undefined);
  if (missing.length > 0) {
    out.errors.push({ line: lines[0]!.line, message: `The header has no column for the ${missing.map((c) => COLUMN_WORDS[c]).join(' or ')}. Name the columns date, tmin and tmax (or min/low and max/high).` });
    return out;
  }
  const seen = new Map<string, number>();
  for (const { raw, line } of header ? lines.slice(1) : lines) {
    const cells = raw.split(delimiter).map(clean);
    const date = toIsoDate(cells[columns.date!] ?? '');
    const tmin = toNumber(cells[columns.tmin!] ?? '', decimalComma);
    const tmax = toNumber(cells[columns.tmax!] ?? '', decimalComma);
    if (tmin === null || tmax === null) {
      out.errors.push({ line, message: `The ${tmin === null ? 'minimum' : 'maximum'} is missing.` });
      continue;
    }
    const result = dailyTemperatureSchema.safeParse({ date, tmin, tmax });
    if (!result.success) {
      out.errors.push({ line, message: result.error.issues.map((i) => i.message).join('; ').replace('Not a real date', `"${date}" is not a real date`) + '.' });
      continue;
    }
    if (seen.has(date)) {
      out.errors.push({ line, message: `${date} already appears on line ${seen.get(date)}.` });
      continue;
    }
    seen.set(date, line);
    out.days.push(result.data);
    out.lines.push(line);
  }
  if (out.days.length > MAX_TOOL_DAYS) out.errors.unshift({ line: 0, message: `That is ${out.days.length} days; the calculator takes up to ${MAX_TOOL_DAYS.toLocaleString('en-GB')} at a time.` });
  return out;
}
