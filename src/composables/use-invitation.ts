import type { Ref } from 'vue';
import type { InvitationAccept, InvitationAccepted, InvitationPreview } from '../../server/schemas/team';
import { getMe } from '../api/auth';
import { acceptInvitation, previewInvitation } from '../api/team';
import { useGroupsStore } from '../stores/groups';
import { useSessionStore } from '../stores/session';
import { useResource } from './use-resource';

/** An invitation link: what it offers, and accepting it (which may also create and sign in an account). */
export function useInvitation(token: Readonly<Ref<string>>) {
  const session = useSessionStore();
  const groups = useGroupsStore();
  const preview = useResource<InvitationPreview>(() => previewInvitation(token.value), [token]);

  async function accept(body: InvitationAccept = {}): Promise<InvitationAccepted> {
    const wasSignedIn = session.isSignedIn;
    const accepted = await acceptInvitation(token.value, body);
    // Accepting signed out made the account and signed it in on the server; the page learns who it is.
    if (!wasSignedIn) session.$patch({ person: await getMe(), isLoaded: true });
    await groups.load();
    groups.switchTo(accepted.groupId);
    return accepted;
  }

  return { preview, accept };
}
