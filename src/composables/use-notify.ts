import { useToast } from 'primevue/usetoast';
import { ApiError } from '../api/http';
import { undoToastLifeMs } from '../config';

/** What the toast of an undoable change carries; AppToasts draws the Undo button from it. */
export interface UndoDetail {
  text: string;
  undo: () => Promise<void>;
}

export function describeError(err: unknown): string {
  if (err instanceof ApiError) {
    if (err.status === 429) return 'Too many attempts — wait a few minutes';
    if (err.status === 403) return err.message || 'Your role in this group does not allow that.';
    if (err.status >= 500) {
      const ref = err.requestId ? ` (reference ${err.requestId})` : '';
      return `Something went wrong on our side. Try again in a moment${ref}.`;
    }
    return err.message;
  }
  if (err instanceof Error) return err.message;
  return 'Something went wrong. Try again.';
}

/** The one way the client raises a toast, so wording and timing stay the same everywhere. */
export function useNotify() {
  const toast = useToast();

  return {
    success(summary: string, detail?: string) {
      toast.add({ severity: 'success', summary, detail, life: 4000 });
    },
    info(summary: string, detail?: string) {
      toast.add({ severity: 'info', summary, detail, life: 5000 });
    },
    error(err: unknown, summary = 'That did not work') {
      // Only the newest problem is shown: ten failed taps should not stack ten red boxes.
      toast.removeGroup('error');
      toast.add({ group: 'error', severity: 'error', summary, detail: describeError(err), life: 8000 });
    },
    undoable(text: string, undo: () => Promise<void>) {
      const detail: UndoDetail = { text, undo };
      toast.add({ group: 'undo', severity: 'secondary', detail, life: undoToastLifeMs });
    },
    remove(message: unknown) {
      toast.remove(message as Parameters<typeof toast.remove>[0]);
    },
  };
}
