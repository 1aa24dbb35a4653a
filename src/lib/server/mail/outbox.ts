/**
 * The persistent outbox (table mail_outbox, migration 017). Services call `enqueue` with their
 * own transaction, so a message exists exactly when the change it tells of commits; a rolled-back
 * change queues nothing. The dispatcher sends the rows later.
 */
import { QueryTypes, type Transaction } from 'sequelize';
import { User } from '../db/models';
import type { MailContent } from './templates/layout';

export const MAIL_KINDS = [
	'invitation',
	'booking_confirmed',
	'documents_issued',
	'deposit_requested',
	'payment_received',
	'deposit_refunded',
	'document_reminder'
] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

export interface OutgoingMessage extends MailContent {
	kind: MailKind;
	recipient: string;
	/** The same key is queued once (e.g. `payment_received:<deposit>:<user>`). */
	dedupeKey: string;
}

const sequelize = () => User.sequelize!;

/** Queues a message in the caller's transaction. False when its dedupe key was queued before. */
export async function enqueue(
	transaction: Transaction,
	message: OutgoingMessage
): Promise<boolean> {
	const rows = await sequelize().query<{ id: string }>(
		`INSERT INTO mail_outbox (kind, recipient, subject, html, text, dedupe_key)
		 VALUES (:kind, :recipient, :subject, :html, :text, :dedupeKey)
		 ON CONFLICT (dedupe_key) DO NOTHING
		 RETURNING id`,
		{ type: QueryTypes.SELECT, transaction, replacements: { ...message } }
	);
	return rows.length > 0;
}

export interface Recipient {
	id: string;
	name: string;
	email: string;
}

/** The enabled users of an organization (optionally only some roles), read in the transaction. */
export async function organizationRecipients(
	transaction: Transaction,
	organizationId: string,
	roles?: readonly string[]
): Promise<Recipient[]> {
	return sequelize().query<Recipient>(
		`SELECT id, name, email FROM users
		  WHERE organization_id = :organizationId AND NOT disabled
		    ${roles ? 'AND role IN (:roles)' : ''}
		  ORDER BY email`,
		{
			type: QueryTypes.SELECT,
			transaction,
			replacements: { organizationId, roles: roles ? [...roles] : null }
		}
	);
}

/** Queues one message per recipient, each with its own dedupe key. Returns how many were new. */
export async function enqueueForEach(
	transaction: Transaction,
	recipients: Recipient[],
	kind: MailKind,
	key: string,
	content: (recipient: Recipient) => MailContent
): Promise<number> {
	let queued = 0;
	for (const r of recipients) {
		const fresh = await enqueue(transaction, {
			kind,
			recipient: r.email,
			dedupeKey: `${kind}:${key}:${r.id}`,
			...content(r)
		});
		if (fresh) queued++;
	}
	return queued;
}

export interface OutboxRow {
	id: string;
	kind: MailKind;
	recipient: string;
	subject: string;
	status: 'queued' | 'sent' | 'failed';
	attempts: number;
	nextAttemptAt: string;
	lastError: string | null;
	createdAt: string;
	sentAt: string | null;
}

/** The newest outbox rows, for the admin's "Outgoing mail" page. */
export async function listOutbox(limit = 200): Promise<OutboxRow[]> {
	const rows = await sequelize().query<OutboxRow>(
		`SELECT id, kind, recipient, subject, status, attempts, next_attempt_at AS "nextAttemptAt",
		        last_error AS "lastError", created_at AS "createdAt", sent_at AS "sentAt"
		   FROM mail_outbox ORDER BY created_at DESC, id LIMIT :limit`,
		{ type: QueryTypes.SELECT, replacements: { limit } }
	);
	return rows.map((r) => ({
		...r,
		nextAttemptAt: new Date(r.nextAttemptAt).toISOString(),
		createdAt: new Date(r.createdAt).toISOString(),
		sentAt: r.sentAt ? new Date(r.sentAt).toISOString() : null
	}));
}
