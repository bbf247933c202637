import type { z } from 'zod';
import { toCsv } from '../lib/csv';
import { LogEntry } from '../models';
import { logKindLabels, type logListQuerySchema } from '../schemas/log';
import { loadEntries } from './log-read.service';
import { logWhere } from './log.service';

// The log as a CSV file with the table's filters. Every cell goes through csvCell, so text a member
// typed (a note starting with "=", say) reaches a spreadsheet as text, never as a formula.

type ExportQuery = Omit<z.output<typeof logListQuerySchema>, 'page' | 'pageSize'>;

/** Far more than a group logs in years; a bigger export would hold the server for too long. */
export const MAX_EXPORT_ROWS = 20_000;
const PAGE = 500;

const header = ['Date', 'Kind', 'Details', 'Plants', 'Sites', 'Done by', 'Recorded by', 'Notes', 'Stone-fruit check', 'Reason for cutting anyway', 'No picking before', 'Care windows done', 'Photos'] as const;

export async function exportLogCsv(groupId: string, q: ExportQuery): Promise<string> {
  const ids = (await LogEntry.findAll({
    where: logWhere(groupId, q), attributes: ['id'], order: [['doneOn', 'DESC'], ['createdAt', 'DESC'], ['id', 'ASC']], limit: MAX_EXPORT_ROWS,
  })).map((r) => r.id);
  const rows: (string | number)[][] = [];
  for (let i = 0; i < ids.length; i += PAGE) {
    for (const e of await loadEntries(groupId, ids.slice(i, i + PAGE))) {
      const verdicts = e.plants.filter((p) => p.guard).map((p) => `${p.name}: ${p.guard!.verdict}`);
      rows.push([
        e.doneOn, logKindLabels[e.kind], e.summary, e.plants.map((p) => p.name).join('; '), [...new Set(e.plants.map((p) => p.siteName))].join('; '),
        e.doneBy?.name ?? '', e.recordedBy?.name ?? '', e.notes, verdicts.join('; '), e.overrideReason ?? '', e.pickingSafeFrom ?? '',
        e.windowsDone.map((w) => w.label).join('; '), e.photos.length,
      ]);
    }
  }
  return toCsv(header, rows);
}
