import { sequelize } from '../db';
import { readCsv, toCsv } from '../lib/csv';
import { AppError, validationFailed } from '../lib/errors';
import { Plant, Site } from '../models';
import { healthFlags, plantFormLabels, plantForms, plantTypeCodes, plantTypeLabels, type HealthFlag } from '../schemas/catalogue';
import { plantCreateSchema, type PlantCreate } from '../schemas/plant';
import {
  PLANT_CSV_MAX_ROWS, plantCsvColumns, plantCsvRequired, type PlantCsvColumn, type PlantCsvImportResult, type PlantCsvPreview, type PlantCsvRow,
} from '../schemas/plant-csv';

// Plants to and from CSV. The import checks every row against the same schema as the plant form and
// writes all rows in one transaction, or none: a file half-imported is worse than one refused.

const squash = (text: string) => text.toLowerCase().replace(/[^a-z0-9]/g, '');

// Header words people use for each column, compared without case, spaces or punctuation.
const headerNames: Record<PlantCsvColumn, string[]> = {
  site: ['site', 'sitename', 'place'],
  type: ['type', 'typecode', 'planttype', 'kind', 'fruit'],
  cultivar: ['cultivar', 'variety'],
  rootstock: ['rootstock', 'stock'],
  form: ['form', 'shape', 'training'],
  'planted year': ['plantedyear', 'planted', 'yearplanted', 'year'],
  'height m': ['heightm', 'height', 'heightmetres', 'heightmeters'],
  position: ['position', 'positionlabel', 'where', 'location'],
  health: ['health', 'healthflags', 'problems'],
  notes: ['notes', 'note', 'comments'],
};

/** Code or label, in any case: "cherry-sweet", "Sweet cherry" and "SWEET CHERRY" are the same. */
function lookup<C extends string>(codes: readonly C[], labels: Record<C, string>): Map<string, C> {
  return new Map(codes.flatMap((code) => [[squash(code), code], [squash(labels[code]), code]] as [string, C][]));
}
const typeByName = lookup(plantTypeCodes, plantTypeLabels);
const formByName = lookup(plantForms, plantFormLabels);
// Health flags by code; "Silver leaf" squashes to the same letters as "silver-leaf".
const healthByName = new Map(healthFlags.map((flag) => [squash(flag), flag]));

function mapColumns(header: string[]) {
  const index = new Map<PlantCsvColumn, number>();
  const ignored: string[] = [];
  header.forEach((name, i) => {
    const column = plantCsvColumns.find((c) => headerNames[c].includes(squash(name)));
    if (column && !index.has(column)) index.set(column, i);
    else if (name) ignored.push(name);
  });
  const missing = plantCsvRequired.filter((c) => !index.has(c));
  if (missing.length) {
    const message = `The first row must name the columns; ${missing.join(', ')} ${missing.length === 1 ? 'is' : 'are'} missing. Columns: ${plantCsvColumns.join(', ')}.`;
    throw validationFailed([{ path: 'csv', message }], message);
  }
  return { index, ignored };
}

type SiteRef = { id: string; name: string; isArchived: boolean };
interface ParsedRow { view: PlantCsvRow; plant: PlantCreate | null }

function numberCell(text: string): number | null {
  if (text === '') return null;
  const value = Number(text.replace(/\s*m$/i, '').replace(',', '.'));
  return Number.isFinite(value) ? value : NaN;
}

type Cell = (column: PlantCsvColumn) => string;

// Site, type, form and health are looked up by name; the rest is left to the plant schema.
function lookupIssues(cell: Cell, site: SiteRef | undefined, typeCode: string | null, form: string | null, flagCount: number, found: number) {
  const issues: PlantCsvRow['issues'] = [];
  if (!cell('site')) issues.push({ column: 'site', message: 'Name the site' });
  else if (!site) issues.push({ column: 'site', message: `No site called “${cell('site')}” in this group; add it first or fix the name` });
  else if (site.isArchived) issues.push({ column: 'site', message: `${site.name} is archived; restore it first` });
  if (!typeCode) issues.push({ column: 'type', message: cell('type') ? `“${cell('type')}” is not a plant type we know` : 'Name the type of plant' });
  if (!form) issues.push({ column: 'form', message: cell('form') ? `“${cell('form')}” is not a form we know` : 'Name the form (bush, cordon, fan…)' });
  if (found < flagCount) issues.push({ column: 'health', message: `Health problems must be among: ${healthFlags.join(', ')}` });
  return issues;
}

function parseRow(line: number, cells: string[], index: Map<PlantCsvColumn, number>, sites: Map<string, SiteRef>): ParsedRow {
  const cell: Cell = (c) => { const i = index.get(c); return i === undefined ? '' : (cells[i] ?? ''); };
  const site = sites.get(squash(cell('site')));
  const typeCode = typeByName.get(squash(cell('type'))) ?? null;
  const form = formByName.get(squash(cell('form'))) ?? null;
  const flags = cell('health').split(/[;|]/).map((f) => f.trim()).filter(Boolean);
  const found = flags.map((f) => healthByName.get(squash(f))).filter((f): f is HealthFlag => !!f);
  const issues = lookupIssues(cell, site, typeCode, form, flags.length, found.length);
  const candidate = {
    siteId: site?.id, typeCode, form, cultivar: cell('cultivar'), rootstock: cell('rootstock'), positionLabel: cell('position'), notes: cell('notes'),
    plantedYear: numberCell(cell('planted year')), heightM: numberCell(cell('height m')), healthFlags: found,
  };
  const checked = plantCreateSchema.safeParse(candidate);
  const looked = new Set(['siteId', 'typeCode', 'form', 'healthFlags']);
  for (const issue of checked.success ? [] : checked.error.issues) {
    const field = String(issue.path[0] ?? '');
    if (!looked.has(field)) issues.push({ column: columnOf(field), message: issue.message });
  }
  const finite = (n: number | null) => (n !== null && Number.isFinite(n) ? n : null);
  const view: PlantCsvRow = {
    row: line, site: site?.name ?? cell('site'), typeCode, cultivar: candidate.cultivar, form, positionLabel: candidate.positionLabel,
    plantedYear: finite(candidate.plantedYear), heightM: finite(candidate.heightM), issues,
  };
  return { view, plant: checked.success && issues.length === 0 ? checked.data : null };
}

const fieldColumns: Record<string, PlantCsvColumn> = { plantedYear: 'planted year', heightM: 'height m', positionLabel: 'position', healthFlags: 'health' };
const columnOf = (field: string): string => fieldColumns[field] ?? field;

async function parseFile(groupId: string, text: string) {
  const { header, rows } = readCsv(text);
  if (!header.length) throw validationFailed([{ path: 'csv', message: 'The file has no rows' }], 'The file has no rows');
  const { index, ignored } = mapColumns(header);
  if (!rows.length) throw validationFailed([{ path: 'csv', message: 'The file has a header row but no plants under it' }], 'The file has no plants');
  if (rows.length > PLANT_CSV_MAX_ROWS) throw validationFailed([{ path: 'csv', message: `At most ${PLANT_CSV_MAX_ROWS} plants per file` }], `The file has ${rows.length} plants; import at most ${PLANT_CSV_MAX_ROWS} at a time`);
  const siteRows = await Site.findAll({ where: { groupId }, attributes: ['id', 'name', 'archivedAt'] });
  const sites = new Map(siteRows.map((s) => [squash(s.name), { id: s.id, name: s.name, isArchived: s.archivedAt !== null }]));
  const parsed = rows.map((r) => parseRow(r.line, r.cells, index, sites));
  const found = plantCsvColumns.filter((c) => index.has(c));
  return { parsed, columns: { found: [...found], ignored } };
}

export async function previewPlantCsv(groupId: string, text: string): Promise<PlantCsvPreview> {
  const { parsed, columns } = await parseFile(groupId, text);
  return { columns, total: parsed.length, valid: parsed.filter((p) => p.plant).length, rows: parsed.map((p) => p.view) };
}

export async function importPlantCsv(groupId: string, text: string): Promise<PlantCsvImportResult> {
  const { parsed } = await parseFile(groupId, text);
  const bad = parsed.filter((p) => !p.plant);
  if (bad.length) {
    const issues = bad.map((p) => ({ path: `rows.${p.view.row}`, message: `Row ${p.view.row}: ${p.view.issues.map((i) => `${i.column}: ${i.message}`).join('; ')}` }));
    throw new AppError('UNPROCESSABLE', `${bad.length} of ${parsed.length} rows need attention; nothing was imported`, issues);
  }
  const records = parsed.map((p) => ({ plantedYear: null, heightM: null, archivedAt: null, ...p.plant!, groupId }));
  await sequelize.transaction((transaction) => Plant.bulkCreate(records as unknown as Plant[], { transaction, validate: false }));
  return { added: records.length };
}

export async function exportPlantCsv(groupId: string, includeArchived: boolean): Promise<string> {
  const plants = await Plant.findAll({
    where: { groupId, ...(includeArchived ? {} : { archivedAt: null }) },
    include: [{ model: Site, as: 'site', attributes: ['name'] }],
    order: [[{ model: Site, as: 'site' }, 'name', 'ASC'], ['positionLabel', 'ASC'], ['id', 'ASC']],
  });
  const rows = plants.map((p) => [
    p.site?.name ?? '', p.typeCode, p.cultivar, p.rootstock, p.form, p.plantedYear, p.heightM, p.positionLabel, p.healthFlags.join('; '), p.notes,
  ]);
  // A byte-order mark lets spreadsheet programs read "Doyenné" as UTF-8 rather than guess.
  return `\uFEFF${toCsv(plantCsvColumns, rows)}`;
}
