/**
 * Supporting-document e-mails. Called inside the transaction that marks the reminder sent, so a
 * notice is queued in the outbox exactly when that mark commits (and never twice).
 */
import { QueryTypes, type Transaction } from 'sequelize';
import { enqueueForEach, type Recipient } from '../mail/outbox';
import { mailOrigin } from '../mail/origin';
import { documentExpiringMail } from '../mail/templates/messages';
import { User } from '../db/models';

export interface DocumentExpiringNotice {
	documentId: string;
	kind: string;
	/** e.g. 'UN38.3 test summary'. */
	kindLabel: string;
	title: string;
	/** YYYY-MM-DD: the last day the document counts. */
	expiresOn: string;
	/** Whole days from the reminder's date to expiresOn (0 = lapses at the end of today). */
	daysLeft: number;
	/** What it is filed on: a shipment (reference) or a product (SKU). */
	owner:
		{ shipmentId: string; shipmentReference: string } | { productId: string; productSku: string };
	/** Who uploaded it (null when that account was removed); the outbox decides who else hears. */
	uploadedByUserId: string | null;
	/** Path inside Landfall to the card that holds it, e.g. '/products/…#supporting-documents-heading'. */
	path: string;
}

/**
 * Who keeps documents current: the enabled coordinators of the uploader's organization (the
 * exporter), and the uploader if still enabled; every enabled coordinator when the uploader is gone.
 */
async function keepers(transaction: Transaction, uploader: string | null): Promise<Recipient[]> {
	return User.sequelize!.query<Recipient>(
		`SELECT id, name, email FROM users u
		  WHERE NOT u.disabled
		    AND (u.id = :uploader OR (u.role = 'coordinator' AND (
		         :uploader::uuid IS NULL
		         OR u.organization_id = (SELECT organization_id FROM users WHERE id = :uploader))))
		  ORDER BY email`,
		{ type: QueryTypes.SELECT, transaction, replacements: { uploader } }
	);
}

/** A supporting document lapses soon: tell the people who keep it current. */
export async function documentExpiring(
	transaction: Transaction,
	notice: DocumentExpiringNotice
): Promise<void> {
	const origin = mailOrigin();
	const filedOn =
		'shipmentReference' in notice.owner
			? `shipment ${notice.owner.shipmentReference}`
			: `product ${notice.owner.productSku}`;
	await enqueueForEach(
		transaction,
		await keepers(transaction, notice.uploadedByUserId),
		'document_reminder',
		notice.documentId,
		(r) =>
			documentExpiringMail({
				origin,
				name: r.name,
				kindLabel: notice.kindLabel,
				title: notice.title,
				expiresOn: notice.expiresOn,
				daysLeft: notice.daysLeft,
				filedOn,
				link: new URL(notice.path, origin).toString()
			})
	);
}
