import { QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import type { Operations, OperationsMail, OperationsSite } from '../schemas/reminders';

// The operator view: the last daily pass per site, and the mail waiting or given up on. A group's
// owner sees their group's sites and the reminder digests of its members; a server admin sees all.

const LIST_LIMIT = 100;
const SITE_LIMIT = 500;

interface Scope { groupId: string | null }

async function sites(scope: Scope): Promise<OperationsSite[]> {
  const rows = await sequelize.query<{ site_id: string; site_name: string; group_id: string; group_name: string; time_zone: string; date: string | null; status: 'done' | 'failed' | null; finished_at: Date | null; plants: number; windows_written: number; reminders: number; error: string | null }>(
    `SELECT s.id AS site_id, s.name AS site_name, g.id AS group_id, g.name AS group_name, s.time_zone,
       to_char(sp.date, 'YYYY-MM-DD') AS date, sp.status, sp.finished_at, sp.plants, sp.windows_written, sp.reminders, sp.error
     FROM sites s JOIN groups g ON g.id = s.group_id
     LEFT JOIN LATERAL (SELECT * FROM site_passes WHERE site_id = s.id ORDER BY date DESC LIMIT 1) sp ON true
     WHERE s.archived_at IS NULL AND ($1::uuid IS NULL OR s.group_id = $1::uuid)
     ORDER BY (sp.status = 'failed') DESC NULLS FIRST, sp.date NULLS FIRST, g.name, s.name
     LIMIT $2`,
    { bind: [scope.groupId, SITE_LIMIT], type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    siteId: r.site_id, siteName: r.site_name, groupId: r.group_id, groupName: r.group_name, timeZone: r.time_zone,
    lastPass: r.date && r.status && r.finished_at
      ? { date: r.date, status: r.status, finishedAt: r.finished_at.toISOString(), plants: r.plants, windowsWritten: r.windows_written, reminders: r.reminders, error: r.error }
      : null,
  }));
}

// Only reminder digests are shown to an owner: a member's password-reset mail is nobody else's business.
const mailScope = `($1::uuid IS NULL OR (o.kind = 'reminder-digest' AND o.to_address IN (
  SELECT u.email FROM users u JOIN memberships m ON m.user_id = u.id WHERE m.group_id = $1::uuid)))`;

async function mail(scope: Scope, statuses: string[]): Promise<OperationsMail[]> {
  const rows = await sequelize.query<{ id: string; kind: string; to_address: string; status: OperationsMail['status']; attempts: number; next_attempt_at: Date; last_error: string | null; created_at: Date; updated_at: Date }>(
    `SELECT o.id, o.kind, o.to_address, o.status, o.attempts, o.next_attempt_at, o.last_error, o.created_at, o.updated_at
     FROM outbox_messages o WHERE o.status = ANY($2::text[]) AND ${mailScope}
     ORDER BY o.updated_at DESC LIMIT $3`,
    { bind: [scope.groupId, statuses, LIST_LIMIT], type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    id: r.id, kind: r.kind, to: r.to_address, status: r.status, attempts: r.attempts, nextAttemptAt: r.next_attempt_at.toISOString(),
    lastError: r.last_error, createdAt: r.created_at.toISOString(), updatedAt: r.updated_at.toISOString(),
  }));
}

async function counts(scope: Scope): Promise<Operations['counts']> {
  const [row] = await sequelize.query<{ sites: string; queued: string; failed: string; sent: string }>(
    `SELECT (SELECT count(*) FROM sites s WHERE s.archived_at IS NULL AND ($1::uuid IS NULL OR s.group_id = $1::uuid)) AS sites,
       count(*) FILTER (WHERE o.status IN ('pending', 'sending')) AS queued,
       count(*) FILTER (WHERE o.status = 'failed') AS failed,
       count(*) FILTER (WHERE o.status = 'sent' AND o.sent_at > now() - interval '1 day') AS sent
     FROM outbox_messages o WHERE ${mailScope}`,
    { bind: [scope.groupId], type: QueryTypes.SELECT },
  );
  return { sites: Number(row?.sites ?? 0), queued: Number(row?.queued ?? 0), failed: Number(row?.failed ?? 0), sentLastDay: Number(row?.sent ?? 0) };
}

async function operations(scope: Scope): Promise<Operations> {
  const [siteList, queued, failed, totals] = await Promise.all([sites(scope), mail(scope, ['pending', 'sending']), mail(scope, ['failed']), counts(scope)]);
  return { sites: siteList, queued, failed, counts: totals };
}

export const groupOperations = (groupId: string) => operations({ groupId });
export const allOperations = () => operations({ groupId: null });
