import { ref, shallowRef, type Ref } from 'vue';
import type { ErrorIssue } from '../../server/schemas/error';
import { UPLOAD_LIMIT_BYTES, type ColumnMapping, type UploadOptions, type UploadPreview, type UploadResult } from '../../server/schemas/readings';
import { ApiError } from '../api/http';
import { importUpload, previewUpload } from '../api/readings';
import { useGroupsStore } from '../stores/groups';
import { describeError } from './use-notify';

export type UploadPhase = 'idle' | 'sending' | 'reading' | 'importing';
type Choices = Required<Pick<UploadOptions, 'dateOrder' | 'onExisting'>> & Pick<UploadOptions, 'mapping' | 'unit'>;

const freshChoices = (): Choices => ({ dateOrder: 'auto', onExisting: 'skip' });

/**
 * The two-step CSV upload: pick a file and see what we read (the server parses it, nothing is
 * written), adjust columns, unit, dates and what to do with stored days, then import. The same file
 * is sent again for the import, so nothing half-done is ever kept on the server.
 */
export function useReadingUpload(siteId: Readonly<Ref<string>>) {
  const groups = useGroupsStore();
  const file = shallowRef<File | null>(null);
  const choices = ref<Choices>(freshChoices());
  const preview = shallowRef<UploadPreview | null>(null);
  const phase = ref<UploadPhase>('idle');
  const progress = ref<number | null>(null);
  const problem = ref<string | null>(null);
  const rowIssues = ref<ErrorIssue[]>([]);

  const onProgress = (fraction: number | null) => {
    progress.value = fraction;
    if (fraction === null && phase.value === 'sending') phase.value = 'reading';
  };

  function fail(err: unknown): void {
    problem.value = describeError(err);
    rowIssues.value = err instanceof ApiError && err.status === 422 ? err.issues : [];
  }

  async function send<T>(call: (groupId: string, f: File) => Promise<T>, busy: UploadPhase): Promise<T | null> {
    if (!file.value || !groups.currentGroupId) return null;
    phase.value = busy;
    progress.value = 0;
    problem.value = null;
    rowIssues.value = [];
    try {
      return await call(groups.currentGroupId, file.value);
    } catch (err) {
      fail(err);
      return null;
    } finally {
      phase.value = 'idle';
      progress.value = null;
    }
  }

  async function refresh(): Promise<void> {
    const answer = await send((g, f) => previewUpload(g, siteId.value, f, choices.value, onProgress), 'sending');
    if (answer) preview.value = answer;
  }

  async function choose(picked: File | null): Promise<void> {
    preview.value = null;
    choices.value = freshChoices();
    file.value = picked;
    if (picked && picked.size > UPLOAD_LIMIT_BYTES) {
      // Said before sending: a phone would otherwise push 5 MB up a weak signal only to be refused.
      problem.value = `${picked.name} is larger than 5 MB. Split it into several files (a few years each) and upload them one by one.`;
      file.value = null;
      return;
    }
    if (picked) await refresh();
  }

  async function change(next: Partial<Choices>): Promise<void> {
    choices.value = { ...choices.value, ...next };
    if (next.mapping || next.unit || next.dateOrder) await refresh();
  }

  const setMapping = (mapping: ColumnMapping) => change({ mapping });

  async function commit(): Promise<UploadResult | null> {
    return send((g, f) => importUpload(g, siteId.value, f, { ...choices.value, mapping: choices.value.mapping ?? completeMapping() }, onProgress), 'importing');
  }

  // What the preview detected, sent back as the person's choice so the import reads the file the same way.
  function completeMapping(): ColumnMapping | undefined {
    const m = preview.value?.mapping;
    return m && m.date !== null && m.tmin !== null && m.tmax !== null ? { date: m.date, tmin: m.tmin, tmax: m.tmax, rain: m.rain } : undefined;
  }

  function reset(): void {
    void choose(null);
    problem.value = null;
    rowIssues.value = [];
  }

  return { file, choices, preview, phase, progress, problem, rowIssues, choose, change, setMapping, commit, reset };
}
