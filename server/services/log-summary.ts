import { leafSizeBandLabels, pruneTypeLabels, type LogDetails, type LogKind } from '../schemas/log';

// One line in the grower's words for an entry's details: the history, the table and the CSV show it.

const n = (x: number) => x.toLocaleString('en-GB', { maximumFractionDigits: 2 });

type Summarisers = { [K in LogKind]: (d: LogDetails[K]) => string };

const summarisers: Summarisers = {
  prune: (d) => `${pruneTypeLabels[d.pruneType].split(' (')[0]} prune`,
  feed: (d) => [
    d.npk ? `${d.product} (${n(d.npk.n)}-${n(d.npk.p)}-${n(d.npk.k)})` : d.product,
    `${n(d.amount)} ${d.unit}`,
    d.areaM2 ? `over ${n(d.areaM2)} m²` : '',
  ].filter(Boolean).join(', '),
  mulch: (d) => (d.material ? `Mulched with ${d.material}` : 'Mulched'),
  thin: (d) => [
    'Thinned',
    d.fruitsPerCluster !== null ? `to ${d.fruitsPerCluster} per cluster` : '',
    d.spacingCm !== null ? `${n(d.spacingCm)} cm apart` : '',
  ].filter(Boolean).join(', ').replace('Thinned, ', 'Thinned '),
  pinch: () => 'Pinched out laterals',
  'leaf-pick': (d) => `${n(d.leafCount)} leaves, ${leafSizeBandLabels[d.sizeBand]}`,
  harvest: (d) => [d.weightKg !== null ? `${n(d.weightKg)} kg` : '', d.count !== null ? `${n(d.count)} picked` : ''].filter(Boolean).join(', '),
  // The day picking is safe again has its own line (and CSV column), so the summary leaves it out.
  spray: (d) => `${d.product}, ${d.harvestIntervalDays}-day harvest interval`,
  water: (d) => (d.litres ? `${n(d.litres)} l` : 'Watered'),
  note: () => '',
};

export function summarise(kind: LogKind, details: Record<string, unknown>): string {
  const fn = summarisers[kind] as (d: unknown) => string;
  try {
    return fn(details);
  } catch {
    // Details stored under an older shape must not break the history: show the kind alone.
    return '';
  }
}
