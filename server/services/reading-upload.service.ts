import type { z } from 'zod';
import { todayIn } from '../care';
import { sequelize } from '../db';
import { AppError, validationFailed } from '../lib/errors';
import { detectDateOrder, detectMapping, detectUnit, parseTable, readRows, decodeCsvText, type CsvTable, type ReadRow } from '../lib/readings-csv';
import type { ColumnMapping, UploadPreview, UploadResult, uploadOptionsSchema } from '../schemas/readings';
import { latestReadingOf, siteInGroup, storedDates, writeDays } from './readings.service';

type Options = z.output<typeof uploadOptionsSchema>;
type Detected = { [K in keyof ColumnMapping]: number | null };

/** How many of the first rows the preview shows, and how many problem rows at most. */
const SAMPLE_ROWS = 20;
const MAX_PREVIEW_ROWS = 200;
const MAX_ISSUES = 50;

const fieldWords: Record<'date' | 'tmin' | 'tmax', string> = { date: 'date', tmin: 'minimum', tmax: 'maximum' };

function checkMapping(mapping: Detected, columns: number): string[] {
  const problems: string[] = [];
  for (const field of ['date', 'tmin', 'tmax'] as const) {
    if (mapping[field] === null) problems.push(`Choose the column with the ${fieldWords[field]}`);
  }
  for (const [field, index] of Object.entries(mapping)) {
    if (index !== null && index >= columns) problems.push(`The ${fieldWords[field as 'date'] ?? 'rain'} column is not in the file`);
  }
  const chosen = [mapping.date, mapping.tmin, mapping.tmax].filter((i) => i !== null);
  if (new Set(chosen).size !== chosen.length) problems.push('Date, minimum and maximum must be three different columns');
  return problems;
}

/** The file read with the person's choices, or with what we detect where they made none. */
function readUpload(buffer: Buffer, options: Options, today: string) {
  const table = parseTable(decodeCsvText(buffer));
  const mapping: Detected = options.mapping ?? detectMapping(table.header);
  const problems = checkMapping(mapping, table.header.length);
  const unit = options.unit ? { unit: options.unit, note: 'The unit you chose.' } : detectUnit(table, mapping);
  const dates = mapping.date === null ? [] : table.rows.map((r) => r[mapping.date!] ?? '');
  const order = options.dateOrder === 'auto' ? detectDateOrder(dates) : { order: options.dateOrder, note: 'The date order you chose.' };
  const rows = problems.length ? [] : readRows(table, { mapping: mapping as ColumnMapping, unit: unit.unit, order: order.order, today });
  return { table, mapping, problems, unit, order, rows };
}

function previewRows(rows: ReadRow[], stored: Set<string>) {
  const shown = rows.filter((r, i) => i < SAMPLE_ROWS || r.errors.length > 0).slice(0, MAX_PREVIEW_ROWS);
  return shown.map((r) => ({ ...r, isStored: r.date !== null && stored.has(r.date) }));
}

function dateSpan(rows: ReadRow[]): { first: string | null; last: string | null } {
  const dates = rows.flatMap((r) => (r.date ? [r.date] : [])).sort();
  return { first: dates[0] ?? null, last: dates[dates.length - 1] ?? null };
}

const columnsOf = (table: CsvTable) => table.header.map((name, i) => ({ name, example: table.rows.find((r) => r[i])?.[i] ?? '' }));

export async function previewUpload(groupId: string, siteId: string, buffer: Buffer, options: Options): Promise<UploadPreview> {
  const site = await siteInGroup(groupId, siteId);
  const { table, mapping, problems, unit, order, rows } = readUpload(buffer, options, todayIn(site.timeZone));
  const span = dateSpan(rows);
  const stored = span.first && span.last ? await storedDates(siteId, span.first, span.last) : new Set<string>();
  const withErrors = rows.filter((r) => r.errors.length > 0).length;
  return {
    columns: columnsOf(table), mappingProblems: problems, mapping,
    unit: unit.unit, unitNote: unit.note, dateOrder: order.order, dateNote: order.note, onExisting: options.onExisting,
    rows: previewRows(rows, stored),
    totals: { rows: table.rows.length, valid: rows.length - withErrors, withErrors, alreadyStored: rows.filter((r) => r.date && stored.has(r.date)).length },
    firstDate: span.first, lastDate: span.last,
  };
}

function refuseBadRows(rows: ReadRow[]): void {
  const bad = rows.filter((r) => r.errors.length > 0);
  if (bad.length === 0) return;
  const issues = bad.slice(0, MAX_ISSUES).map((r) => ({ path: `rows.${r.row}`, message: `Row ${r.row}: ${r.errors.join('; ')}` }));
  const more = bad.length > MAX_ISSUES ? ` (the first ${MAX_ISSUES} are listed)` : '';
  const count = bad.length === 1 ? '1 row needs' : `${bad.length} rows need`;
  throw new AppError('UNPROCESSABLE', `${count} attention${more}; nothing was imported`, issues);
}

/** All rows or none: any row with a problem stops the import before anything is written. */
export async function importUpload(groupId: string, siteId: string, buffer: Buffer, options: Options): Promise<UploadResult> {
  const site = await siteInGroup(groupId, siteId);
  const { problems, rows } = readUpload(buffer, options, todayIn(site.timeZone));
  if (problems.length) throw validationFailed(problems.map((message) => ({ path: 'options.mapping', message })), problems.join('. '));
  refuseBadRows(rows);
  const days = rows.map((r) => ({ date: r.date!, tminC: r.tminC!, tmaxC: r.tmaxC!, rainMm: r.rainMm }));
  const span = dateSpan(rows);
  const written = await sequelize.transaction(async (transaction) => {
    const counts = await writeDays(siteId, days, 'upload', options.onExisting, transaction);
    return { ...counts, latestReading: await latestReadingOf(siteId, transaction) };
  });
  return {
    added: written.added, replaced: written.replaced, skipped: days.length - written.added - written.replaced,
    firstDate: span.first!, lastDate: span.last!, latestReading: written.latestReading,
  };
}
