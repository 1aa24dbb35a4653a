import type { Transaction } from 'sequelize';
import { AuditEvent, type AuditJson } from '../db/models';

export interface AuditEntry {
	actorUserId: string | null;
	action: string;
	entity: string;
	entityId?: string | null;
	before?: AuditJson;
	after?: AuditJson;
	ip?: string | null;
}

/** Writes one audit event, inside the caller's transaction when given one. */
export async function recordAudit(entry: AuditEntry, transaction?: Transaction): Promise<void> {
	await AuditEvent.create(
		{
			actorUserId: entry.actorUserId,
			action: entry.action,
			entity: entry.entity,
			entityId: entry.entityId ?? null,
			before: entry.before ?? null,
			after: entry.after ?? null,
			ip: entry.ip ?? null
		},
		{ transaction }
	);
}

export interface AuditRow {
	id: string;
	occurredAt: string;
	action: string;
	entity: string;
	entityId: string | null;
	actorName: string | null;
	actorEmail: string | null;
	before: AuditJson;
	after: AuditJson;
	ip: string | null;
}

export async function listAuditEvents(options: { limit: number; offset: number }) {
	const sequelize = AuditEvent.sequelize!;
	const [rows] = await sequelize.query(
		`SELECT a.id::text, a.occurred_at AS "occurredAt", a.action, a.entity, a.entity_id AS "entityId",
		        u.name AS "actorName", u.email AS "actorEmail", a.before, a.after, a.ip
		   FROM audit_events a LEFT JOIN users u ON u.id = a.actor_user_id
		  ORDER BY a.occurred_at DESC, a.id DESC
		  LIMIT :limit OFFSET :offset`,
		{ replacements: options }
	);
	const total = await AuditEvent.count();
	return {
		total,
		rows: (rows as (Omit<AuditRow, 'occurredAt'> & { occurredAt: Date })[]).map((row) => ({
			...row,
			occurredAt: row.occurredAt.toISOString()
		}))
	};
}
