import { z } from 'zod';

// Plants in bulk: CSV export, and an import in two steps (preview, then all rows or none).

export const PLANT_CSV_MAX_ROWS = 2000;
// The API takes JSON bodies up to 256 kB (server/app.ts); the file's text must fit inside one.
export const PLANT_CSV_MAX_CHARS = 240_000;

/** The columns, in the order the export writes them; the import finds them by name in any order. */
export const plantCsvColumns = ['site', 'type', 'cultivar', 'rootstock', 'form', 'planted year', 'height m', 'position', 'health', 'notes'] as const;
export type PlantCsvColumn = (typeof plantCsvColumns)[number];
export const plantCsvRequired: PlantCsvColumn[] = ['site', 'type', 'form'];

export const plantCsvUploadSchema = z.object({
  csv: z.string({ message: 'Send the file’s text' }).min(1, 'The file is empty').max(PLANT_CSV_MAX_CHARS, 'The file is too large for one import; split it into files of about 1,000 plants'),
});
export type PlantCsvUpload = z.infer<typeof plantCsvUploadSchema>;

export const plantCsvExportQuerySchema = z.object({
  includeArchived: z.enum(['true', 'false']).optional().transform((v) => v === 'true'),
});

export const plantCsvRowSchema = z.object({
  /** The row's place in the file, the header being row 1. */
  row: z.number(),
  site: z.string(),
  typeCode: z.string().nullable(),
  cultivar: z.string(),
  form: z.string().nullable(),
  plantedYear: z.number().nullable(),
  heightM: z.number().nullable(),
  positionLabel: z.string(),
  issues: z.array(z.object({ column: z.string(), message: z.string() })),
});
export type PlantCsvRow = z.infer<typeof plantCsvRowSchema>;

export const plantCsvPreviewSchema = z.object({
  columns: z.object({ found: z.array(z.string()), ignored: z.array(z.string()) }),
  total: z.number(),
  valid: z.number(),
  rows: z.array(plantCsvRowSchema),
});
export type PlantCsvPreview = z.infer<typeof plantCsvPreviewSchema>;

export const plantCsvImportResultSchema = z.object({ added: z.number() });
export type PlantCsvImportResult = z.infer<typeof plantCsvImportResultSchema>;
