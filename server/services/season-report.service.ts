import { QueryTypes } from 'sequelize';
import type { z } from 'zod';
import { hemisphereOf, seasonEnd, seasonStart, todayIn, type Verdict } from '../care';
import { sequelize } from '../db';
import { notFound } from '../lib/errors';
import { Site } from '../models';
import type { PlantTypeCode } from '../schemas/catalogue';
import type { LogDetails } from '../schemas/log';
import type { SeasonReport, seasonReportQuerySchema } from '../schemas/season-report';
import { plantLabel } from './log-plants.service';
import { seasonContaining } from './plant-windows.service';
import { namesOf } from './log-read.service';
import { feedRows, harvestRows, leafRows } from './season-report-sections';

type Query = z.output<typeof seasonReportQuerySchema>;

export interface ReportRow {
  entry_id: string; kind: 'feed' | 'prune' | 'harvest' | 'leaf-pick'; details: Record<string, unknown>; done_on: string;
  done_by: string | null; override_reason: string | null; plant_id: string; guard_verdict: Verdict | null;
  cultivar: string; type_code: PlantTypeCode; plant_count: number;
}

async function rowsFor(groupId: string, siteId: string, from: string, to: string): Promise<ReportRow[]> {
  return sequelize.query<ReportRow>(
    `SELECT e.id AS entry_id, e.kind, e.details, to_char(e.done_on, 'YYYY-MM-DD') AS done_on, e.done_by, e.override_reason,
       lep.plant_id, lep.guard_verdict, p.cultivar, p.type_code,
       (SELECT count(*)::int FROM log_entry_plants x WHERE x.log_entry_id = e.id) AS plant_count
     FROM log_entries e JOIN log_entry_plants lep ON lep.log_entry_id = e.id JOIN plants p ON p.id = lep.plant_id
     WHERE e.group_id = :groupId AND p.site_id = :siteId AND e.done_on BETWEEN :from AND :to
       AND e.kind IN ('feed', 'prune', 'harvest', 'leaf-pick')
     ORDER BY e.done_on, e.created_at, p.cultivar`,
    { replacements: { groupId, siteId, from, to }, type: QueryTypes.SELECT },
  );
}

interface StoredRow { batch_id: string; item: string; label: string; quantity: number; unit: string; method: string; stored_on: string; use_by: string; used_on: string | null; cultivar: string; type_code: PlantTypeCode }

async function storedFor(groupId: string, siteId: string, from: string, to: string): Promise<SeasonReport['stored']> {
  const rows = await sequelize.query<StoredRow>(
    `SELECT b.id AS batch_id, b.item, b.label, b.quantity, b.unit, b.method, to_char(b.stored_on, 'YYYY-MM-DD') AS stored_on,
       to_char(b.use_by, 'YYYY-MM-DD') AS use_by, to_char(b.used_on, 'YYYY-MM-DD') AS used_on, p.cultivar, p.type_code
     FROM store_batches b JOIN store_batch_plants bp ON bp.batch_id = b.id JOIN plants p ON p.id = bp.plant_id
     WHERE b.group_id = :groupId AND p.site_id = :siteId AND b.stored_on BETWEEN :from AND :to
     ORDER BY b.stored_on, b.created_at, p.cultivar`,
    { replacements: { groupId, siteId, from, to }, type: QueryTypes.SELECT },
  );
  const batches = new Map<string, SeasonReport['stored'][number]>();
  for (const r of rows) {
    const batch = batches.get(r.batch_id) ?? { batchId: r.batch_id, item: r.item, label: r.label, quantity: r.quantity, unit: r.unit, method: r.method, storedOn: r.stored_on, useBy: r.use_by, usedOn: r.used_on, plantNames: [] };
    batch.plantNames.push(plantLabel(r.cultivar, r.type_code));
    batches.set(r.batch_id, batch);
  }
  return [...batches.values()];
}

/** The season holding today at the site unless one is asked for; north: the calendar year, south: July to June. */
export async function seasonReport(groupId: string, q: Query): Promise<SeasonReport> {
  const site = await Site.findOne({ where: { id: q.siteId, groupId }, attributes: ['id', 'name', 'latitude', 'timeZone'] });
  if (!site) throw notFound('Site');
  const season = q.season ?? seasonContaining(todayIn(site.timeZone), site.latitude);
  const from = seasonStart(season, hemisphereOf(site.latitude));
  const to = seasonEnd(season, hemisphereOf(site.latitude));
  const rows = (await rowsFor(groupId, site.id, from, to)).map((r) => ({ ...r, plantName: plantLabel(r.cultivar, r.type_code) }));
  const names = await namesOf(rows.filter((r) => r.kind === 'prune').map((r) => r.done_by));
  return {
    site: { id: site.id, name: site.name }, season, from, to,
    feeds: feedRows(rows.filter((r) => r.kind === 'feed')),
    prunes: rows.filter((r) => r.kind === 'prune').map((r) => ({
      entryId: r.entry_id, doneOn: r.done_on, plantName: r.plantName, pruneType: (r.details as LogDetails['prune']).pruneType,
      verdict: r.guard_verdict, overrideReason: r.override_reason, doneBy: r.done_by ? names.get(r.done_by) ?? null : null,
    })),
    harvests: harvestRows(rows.filter((r) => r.kind === 'harvest')),
    leaves: leafRows(rows.filter((r) => r.kind === 'leaf-pick')),
    stored: await storedFor(groupId, site.id, from, to),
  };
}
