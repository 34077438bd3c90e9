/** The audit log: who (actor_id) did what (action) to which thing (target), when. Append-only. */
import type { Knex } from 'knex';
import { db } from './knex';

export type AuditAction =
  | 'account.signed_up'
  | 'account.email_verified'
  | 'account.role_changed'
  | 'account.deactivated'
  | 'account.reactivated'
  | 'account.password_reset'
  | 'account.password_changed'
  | 'account.sessions_ended'
  | 'invitation.sent'
  | 'invitation.accepted'
  | 'school.proposed'
  | 'school.updated'
  | 'school.accepted'
  | 'school.merged'
  | 'class.created'
  | 'class.updated'
  | 'class.code_rotated'
  | 'entry.created'
  | 'entry.deleted'
  | 'entry.submit'
  | 'entry.team_submitted'
  | 'entry.approve'
  | 'entry.withdraw'
  | 'entry.publish'
  | 'entry.return'
  | 'entry.decline'
  | 'event.created'
  | 'event.updated'
  | 'event.attendance_recorded'
  | 'link.created'
  | 'link.updated'
  | 'model.shared'
  | 'model.unshared'
  | 'model.deleted';

export interface AuditEvent {
  id: string;
  actorId: string | null;
  actorEmail: string | null;
  action: AuditAction;
  targetType: string;
  targetId: string;
  details: Record<string, unknown>;
  createdAt: string;
}

/** Appends one event. */
export async function auditRecord(
  event: {
    actorId: string | null;
    action: AuditAction;
    targetType: string;
    targetId: string;
    details?: Record<string, unknown>;
  },
  trx: Knex = db(),
): Promise<void> {
  await trx('audit_events').insert({
    actor_id: event.actorId,
    action: event.action,
    target_type: event.targetType,
    target_id: event.targetId,
    details: JSON.stringify(event.details ?? {}),
  });
}

/** The latest events, newest first, optionally for one target. */
export async function auditList(options: { targetId?: string; limit?: number } = {}, trx: Knex = db()) {
  const query = trx('audit_events')
    .leftJoin('users', 'users.id', 'audit_events.actor_id')
    .select('audit_events.*', 'users.email as actor_email')
    .orderBy('audit_events.id', 'desc')
    .limit(Math.min(options.limit ?? 100, 500));
  if (options.targetId) query.where('audit_events.target_id', options.targetId);
  const rows = await query;
  return rows.map((r): AuditEvent => ({
    id: String(r.id),
    actorId: r.actor_id,
    actorEmail: r.actor_email ?? null,
    action: r.action,
    targetType: r.target_type,
    targetId: r.target_id,
    details: r.details ?? {},
    createdAt: new Date(r.created_at).toISOString(),
  }));
}
