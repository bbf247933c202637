import { useConfirm } from 'primevue/useconfirm';
import { formatDay } from './use-dates';
import { useLogActions } from './use-log';
import { useNotify } from './use-notify';
import { logKindLabels, type LogEntry } from '../../server/schemas/log';
import { useGroupsStore } from '../stores/groups';
import { useSessionStore } from '../stores/session';

/** Who may delete an entry (its author or an owner, as the server checks) and the asking before it goes. */
export function useLogDelete(onDeleted: () => void | Promise<void>) {
  const confirm = useConfirm();
  const notify = useNotify();
  const actions = useLogActions();
  const groups = useGroupsStore();
  const session = useSessionStore();

  const canDelete = (entry: LogEntry) => groups.role === 'owner' || (entry.recordedBy?.id === session.person?.id && groups.role !== 'viewer');

  function ask(entry: LogEntry): void {
    const what = `${logKindLabels[entry.kind].toLowerCase()} of ${formatDay(entry.doneOn, true)}`;
    confirm.require({
      header: 'Delete this entry?',
      message: `Delete the ${what}? Its photos go with it, and any care window it ticked off opens again.`,
      icon: 'pi pi-trash',
      acceptProps: { label: 'Delete', severity: 'danger' },
      rejectProps: { label: 'Keep it', severity: 'secondary', outlined: true },
      defaultFocus: 'reject',
      accept: async () => {
        try {
          await actions.remove(entry.id);
          notify.success('Entry deleted');
          await onDeleted();
        } catch (err) {
          notify.error(err, 'Could not delete');
        }
      },
    });
  }

  return { canDelete, ask };
}
