/**
 * Expiry of supporting documents: which lapse soon, and the one reminder each gets. A document is
 * picked when it is not retired, has no reminder yet, and its expires_on falls from the day of
 * `now` (UTC) up to `withinDays` later. One already past its date is not picked: the readiness
 * check shows it as expired, and a reminder would only say what is already true. Not scoped to
 * a user: this runs for the system (a scheduled job), never for a request.
 */
import { QueryTypes } from 'sequelize';
import { SUPPORTING_KIND_INFO, type SupportingKind } from '../../uploads/document-kinds';
import { Shipment } from '../db/models';
import { documentExpiring, type DocumentExpiringNotice } from './document-notices';

// The models' connection, as in supporting-documents.ts (also used outside SvelteKit).
const db = () => Shipment.sequelize!;

/** How far ahead reminders look by default: a month to obtain a fresh summary or declaration. */
export const REMINDER_DAYS = 30;

export interface ExpiringDocument {
	id: string;
	kind: SupportingKind;
	title: string;
	expiresOn: string;
	shipmentId: string | null;
	shipmentReference: string | null;
	productId: string | null;
	productSku: string | null;
	uploadedBy: string | null;
}

const utcDate = (d: Date) => d.toISOString().slice(0, 10);

function withinDaysOk(withinDays: number) {
	if (!Number.isInteger(withinDays) || withinDays < 0 || withinDays > 3660)
		throw new RangeError(`withinDays must be a whole number of days from 0 to 3660: ${withinDays}`);
}

const PICK = `
	FROM supporting_documents d
	LEFT JOIN shipments s ON s.id = d.shipment_id
	LEFT JOIN products p ON p.id = d.product_id
	WHERE d.retired_at IS NULL AND d.reminder_sent_at IS NULL AND d.expires_on IS NOT NULL
	  AND d.expires_on >= CAST(:today AS date)
	  AND d.expires_on <= CAST(:today AS date) + CAST(:withinDays AS integer)`;

const COLUMNS = `d.id, d.kind, d.title, d.expires_on::text AS "expiresOn",
	d.shipment_id AS "shipmentId", s.reference AS "shipmentReference",
	d.product_id AS "productId", p.sku AS "productSku", d.uploaded_by AS "uploadedBy"`;

/** Documents that lapse within `withinDays` of `now` and have had no reminder, soonest first. */
export async function findExpiringDocuments(
	withinDays: number = REMINDER_DAYS,
	now: Date = new Date()
): Promise<ExpiringDocument[]> {
	withinDaysOk(withinDays);
	return db().query<ExpiringDocument>(
		`SELECT ${COLUMNS} ${PICK} ORDER BY d.expires_on, d.created_at`,
		{ replacements: { today: utcDate(now), withinDays }, type: QueryTypes.SELECT }
	);
}

const dayMs = 24 * 60 * 60 * 1000;

function notice(d: ExpiringDocument, today: string): DocumentExpiringNotice {
	const owner =
		d.shipmentId !== null
			? { shipmentId: d.shipmentId, shipmentReference: d.shipmentReference ?? '' }
			: { productId: d.productId!, productSku: d.productSku ?? '' };
	const path =
		'shipmentId' in owner
			? `/shipments/${owner.shipmentId}#supporting-documents-heading`
			: `/products/${owner.productId}#supporting-documents-heading`;
	return {
		documentId: d.id,
		kind: d.kind,
		kindLabel: SUPPORTING_KIND_INFO[d.kind].label,
		title: d.title,
		expiresOn: d.expiresOn,
		daysLeft: Math.round((Date.parse(d.expiresOn) - Date.parse(today)) / dayMs),
		owner,
		uploadedByUserId: d.uploadedBy,
		path
	};
}

/**
 * Marks every document `findExpiringDocuments` would pick as reminded at `now` and hands each to
 * `documentExpiring`, all in one transaction: if a notice fails, no mark stays. Rows another run
 * holds are skipped (FOR UPDATE SKIP LOCKED), so two runs at once never remind twice. Returns the
 * notices given.
 */
export async function sendExpiryReminders(
	now: Date = new Date(),
	withinDays: number = REMINDER_DAYS
): Promise<DocumentExpiringNotice[]> {
	withinDaysOk(withinDays);
	const today = utcDate(now);
	return db().transaction(async (transaction) => {
		const picked = await db().query<ExpiringDocument>(
			`SELECT ${COLUMNS} ${PICK} ORDER BY d.expires_on, d.created_at FOR UPDATE OF d SKIP LOCKED`,
			{ replacements: { today, withinDays }, transaction, type: QueryTypes.SELECT }
		);
		if (picked.length === 0) return [];
		await db().query(`UPDATE supporting_documents SET reminder_sent_at = :now WHERE id IN (:ids)`, {
			replacements: { now, ids: picked.map((d) => d.id) },
			transaction
		});
		const notices = picked.map((d) => notice(d, today));
		for (const n of notices) await documentExpiring(transaction, n);
		return notices;
	});
}
