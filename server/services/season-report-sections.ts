import type { LogDetails } from '../schemas/log';
import type { Nutrients, SeasonReport } from '../schemas/season-report';
import type { ReportRow } from './season-report.service';

// The report's sections from the season's rows, as pure functions.

type Row = ReportRow & { plantName: string };

function byPlant(rows: Row[]): Map<string, Row[]> {
  const out = new Map<string, Row[]>();
  for (const r of rows) out.set(r.plant_id, [...(out.get(r.plant_id) ?? []), r]);
  return out;
}

const round1 = (x: number) => Math.round(x * 10) / 10;
const GRAMS: Record<string, number | undefined> = { g: 1, kg: 1000 };

/**
 * Nutrients in one application, in grams. The N-P-K on a fertiliser label is per cent by weight of
 * N, P2O5 and K2O (UK Fertilisers Regulations 1991 and EU Regulation 2019/1009 state P and K as
 * the oxides; US labels likewise), so grams of each = grams of product × per cent ÷ 100. A feed in
 * ml or l is not counted: its weight per litre is not known.
 */
export function nutrientsOf(grams: number | null, npk: LogDetails['feed']['npk']): Nutrients | null {
  if (grams === null || !npk) return null;
  return { nG: round1((grams * npk.n) / 100), p2o5G: round1((grams * npk.p) / 100), k2oG: round1((grams * npk.k) / 100) };
}

export function feedRows(rows: Row[]): SeasonReport['feeds'] {
  return [...byPlant(rows).values()].map((list) => {
    const applications = list.map((r) => {
      const d = r.details as LogDetails['feed'];
      // One entry over several plants shares its amount equally among them.
      const share = d.amount / Math.max(1, r.plant_count);
      const perGram = GRAMS[d.unit];
      return {
        entryId: r.entry_id, doneOn: r.done_on, product: d.product, npk: d.npk ? `${d.npk.n}-${d.npk.p}-${d.npk.k}` : null,
        share: round1(share), unit: d.unit, nutrients: nutrientsOf(perGram ? share * perGram : null, d.npk),
      };
    });
    const counted = applications.flatMap((a) => (a.nutrients ? [a.nutrients] : []));
    const totals = counted.length
      ? { nG: round1(counted.reduce((s, n) => s + n.nG, 0)), p2o5G: round1(counted.reduce((s, n) => s + n.p2o5G, 0)), k2oG: round1(counted.reduce((s, n) => s + n.k2oG, 0)) }
      : null;
    return { plantId: list[0]!.plant_id, plantName: list[0]!.plantName, applications, totals, uncounted: applications.length - counted.length };
  });
}

export function harvestRows(rows: Row[]): SeasonReport['harvests'] {
  return [...byPlant(rows).values()].map((list) => {
    const each = list.map((r) => r.details as LogDetails['harvest']);
    // A pick over several plants is shared equally, like a feed, so the site's total stays true.
    const weightKg = list.reduce((s, r, i) => s + (each[i]!.weightKg ?? 0) / Math.max(1, r.plant_count), 0);
    const count = list.reduce((s, r, i) => s + (each[i]!.count ?? 0) / Math.max(1, r.plant_count), 0);
    return { plantId: list[0]!.plant_id, plantName: list[0]!.plantName, weightKg: Math.round(weightKg * 100) / 100, count: Math.round(count), picks: list.length };
  });
}

export function leafRows(rows: Row[]): SeasonReport['leaves'] {
  return [...byPlant(rows).values()].map((list) => {
    const each = list.map((r) => r.details as LogDetails['leaf-pick']);
    const leafCount = list.reduce((s, r, i) => s + each[i]!.leafCount / Math.max(1, r.plant_count), 0);
    return { plantId: list[0]!.plant_id, plantName: list[0]!.plantName, leafCount: Math.round(leafCount), picks: list.length, sizeBands: [...new Set(each.map((d) => d.sizeBand))] };
  });
}
