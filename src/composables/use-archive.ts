import { ref } from 'vue';
import { useConfirm } from 'primevue/useconfirm';
import { useNotify } from './use-notify';

interface ArchiveRequest {
  /** "'Victoria' plum" or "Top allotment" — used in the question and the toast. */
  name: string;
  archive: () => Promise<unknown>;
  restore: () => Promise<unknown>;
  /** Refresh whatever the page shows, after archiving and again after an undo. */
  onChanged: () => void | Promise<void>;
}

/**
 * Archiving asks first, then offers Undo in the toast: people tap the wrong row with wet fingers,
 * and archive keeps the history, so a quick way back is better than a second "are you sure".
 */
export function useArchive() {
  const confirm = useConfirm();
  const notify = useNotify();
  const isArchiving = ref(false);

  function ask(request: ArchiveRequest): void {
    confirm.require({
      header: 'Archive?',
      message: `Archive ${request.name}? It leaves the lists but keeps its history.`,
      icon: 'pi pi-inbox',
      acceptProps: { label: 'Archive', severity: 'danger' },
      rejectProps: { label: 'Keep it', severity: 'secondary', outlined: true },
      defaultFocus: 'reject',
      accept: () => void run(request),
    });
  }

  async function run(request: ArchiveRequest): Promise<void> {
    isArchiving.value = true;
    try {
      await request.archive();
      await request.onChanged();
      notify.undoable(`Archived ${request.name}.`, async () => {
        try {
          await request.restore();
          await request.onChanged();
          notify.success(`${capitalise(request.name)} is back.`);
        } catch (err) {
          notify.error(err, 'Could not undo');
        }
      });
    } catch (err) {
      notify.error(err, 'Could not archive');
    } finally {
      isArchiving.value = false;
    }
  }

  return { ask, isArchiving };
}

function capitalise(text: string): string {
  return text.startsWith("'") ? text : text.charAt(0).toUpperCase() + text.slice(1);
}
