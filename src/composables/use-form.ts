import { nextTick, ref, watch, type Ref } from 'vue';
import type { z } from 'zod';
import { ApiError } from '../api/http';
import { useNotify } from './use-notify';

export type FieldErrors = Record<string, string>;

interface FormOptions<V> {
  /** Turns what the inputs hold (text in a number box, say) into what the schema expects. */
  prepare?: (values: V) => unknown;
  /** Plainer words for a field whose schema message is generic (an enum's "Invalid option", say). */
  messages?: Partial<Record<keyof V & string, string>>;
  /** Toast title when the server refuses, e.g. "Could not sign in". */
  failureTitle?: string;
}

/** "healthFlags.2" and "body.cultivar" both land on the field the person can see. */
function fieldFor(path: string, fields: string[]): string | undefined {
  return path.split('.').find((part) => fields.includes(part));
}

/**
 * A form checked by the same zod schema the server uses. Client issues and the server's `issues`
 * both end up under their fields; anything that belongs to no field goes to the toast.
 */
export function useForm<S extends z.ZodType, V extends object>(schema: S, initial: () => V, options: FormOptions<V> = {}) {
  const values = ref(initial()) as Ref<V>;
  const errors = ref<FieldErrors>({});
  const isSubmitting = ref(false);
  const notify = useNotify();
  let hasTried = false;

  const fields = () => Object.keys(values.value);

  function check(): z.output<S> | null {
    const result = schema.safeParse(options.prepare ? options.prepare(values.value) : values.value);
    const next: FieldErrors = {};
    if (!result.success) {
      for (const issue of result.error.issues) {
        const field = fieldFor(issue.path.map(String).join('.'), fields()) ?? '';
        next[field] ??= options.messages?.[field as keyof V & string] ?? issue.message;
      }
    }
    errors.value = next;
    return result.success ? (result.data as z.output<S>) : null;
  }

  // After the first attempt, errors clear as the person fixes each field rather than on the next tap.
  watch(values, () => {
    if (hasTried) check();
  }, { deep: true });

  function focusFirstError(): void {
    void nextTick(() => document.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus());
  }

  function applyServerError(err: unknown): void {
    if (!(err instanceof ApiError) || err.issues.length === 0) {
      notify.error(err, options.failureTitle);
      return;
    }
    const next: FieldErrors = {};
    const unplaced: string[] = [];
    for (const issue of err.issues) {
      const field = fieldFor(issue.path, fields());
      if (field) next[field] ??= issue.message;
      else unplaced.push(issue.message);
    }
    errors.value = next;
    if (unplaced.length > 0 || Object.keys(next).length === 0) notify.error(new Error(unplaced.join(' ') || err.message), options.failureTitle);
    focusFirstError();
  }

  /** Validates, then runs the action with parsed data; true when the action succeeded. */
  async function submit(action: (data: z.output<S>) => Promise<void>): Promise<boolean> {
    if (isSubmitting.value) return false;
    hasTried = true;
    const data = check();
    if (!data) {
      focusFirstError();
      return false;
    }
    isSubmitting.value = true;
    try {
      await action(data);
      return true;
    } catch (err) {
      applyServerError(err);
      return false;
    } finally {
      isSubmitting.value = false;
    }
  }

  function reset(next: V = initial()): void {
    hasTried = false;
    values.value = next;
    errors.value = {};
  }

  return { values, errors, isSubmitting, submit, reset, applyServerError };
}
