import { computed, ref, shallowRef } from 'vue';
import { ApiError } from '../api/http';
import { calculateDegreeDays } from '../api/tools';
import {
  degreeDaysRequestSchema, type DailyTemperatureInput, type DegreeDaysRequest, type DegreeDaysResponse,
} from '../../server/schemas/tools';
import { parseDaysCsv, type RowError } from './use-days-csv';
import { useNotify } from './use-notify';

export interface DegreeDaySettings {
  unit: DegreeDaysRequest['unit'];
  method: DegreeDaysRequest['method'];
  cutoff: NonNullable<DegreeDaysRequest['cutoff']>;
  lower: number | null;
  upper: number | null;
}

export type SettingsErrors = Partial<Record<'unit' | 'method' | 'cutoff' | 'lower' | 'upper', string>>;

export interface DegreeDayRow extends DailyTemperatureInput {
  dd: number;
  cumulative: number;
}

/**
 * The degree-day page's state: the pasted text, the settings, the answer. Rows with problems are
 * listed by line; the grower either fixes them or chooses to leave them out, never silently.
 */
export function useDegreeDayCalculator() {
  const notify = useNotify();
  const text = ref('');
  const settings = ref<DegreeDaySettings>({ unit: 'C', method: 'single-sine', cutoff: 'horizontal', lower: 10, upper: null });
  const parsed = computed(() => parseDaysCsv(text.value));
  const fieldErrors = ref<SettingsErrors>({});
  const serverRowErrors = ref<RowError[]>([]);
  const rowErrors = computed(() => [...parsed.value.errors, ...serverRowErrors.value]);
  const result = shallowRef<{ rows: DegreeDayRow[]; total: number; unit: DegreeDaySettings['unit'] } | null>(null);
  const isCalculating = ref(false);

  // Issues come back as "days.12.tmin" (row 12 of what was sent) or "upper"; put each where it shows.
  function place(issues: { path: string; message: string }[], lines: number[]): void {
    const fields: SettingsErrors = {};
    const rows: RowError[] = [];
    for (const issue of issues) {
      const [head, index] = issue.path.split('.');
      if (head === 'days') rows.push({ line: lines[Number(index)] ?? 0, message: issue.message });
      else if (head && head in settings.value) fields[head as keyof SettingsErrors] ??= issue.message;
      else rows.push({ line: 0, message: issue.message });
    }
    fieldErrors.value = fields;
    serverRowErrors.value = rows;
  }

  /** `leaveOutBad` runs on the rows that read cleanly, after the grower has seen what was left out. */
  async function calculate(leaveOutBad = false): Promise<void> {
    serverRowErrors.value = [];
    const { days, lines, errors } = parsed.value;
    if (errors.length > 0 && !leaveOutBad) return;
    if (days.length === 0) {
      serverRowErrors.value = [{ line: 0, message: 'Paste or upload some days first: one line per day with the date, minimum and maximum.' }];
      return;
    }
    const s = settings.value;
    const body = {
      unit: s.unit, method: s.method, cutoff: s.cutoff, lower: s.lower ?? undefined,
      ...(s.upper !== null ? { upper: s.upper } : {}), days,
    };
    const check = degreeDaysRequestSchema.safeParse(body);
    if (!check.success) {
      place(check.error.issues.map((i) => ({ path: i.path.join('.'), message: i.path[0] === 'lower' && s.lower === null ? 'Give a lower threshold' : i.message })), lines);
      return;
    }
    fieldErrors.value = {};
    isCalculating.value = true;
    try {
      const answer: DegreeDaysResponse = await calculateDegreeDays(check.data);
      const byDate = new Map(days.map((d) => [d.date, d]));
      result.value = { total: answer.total, unit: s.unit, rows: answer.days.map((d) => ({ ...byDate.get(d.date)!, ...d })) };
    } catch (err) {
      if (err instanceof ApiError && err.issues.length > 0) place(err.issues, lines);
      else notify.error(err, 'Could not work out the degree-days');
    } finally {
      isCalculating.value = false;
    }
  }

  return { text, settings, parsed, fieldErrors, rowErrors, result, isCalculating, calculate };
}
