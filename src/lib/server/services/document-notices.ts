/**
 * Supporting-document e-mails. Called inside the transaction that marks the reminder sent, so a
 * notice is queued through the outbox exactly when that mark commits (and never twice: the
 * dedupe key names the document, its last day and the recipient). It goes to the uploader and
 * to every enabled coordinator, who keep the documents current.
 */
import { QueryTypes, type Transaction } from 'sequelize';
import { User } from '../db/models';
import { enqueueForEach, type Recipient } from '../mail/outbox';
import { mailOrigin } from '../mail/origin';
import { documentReminderMail } from '../mail/templates/messages';

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

/** A supporting document lapses soon: tell the people who keep it current. */
export async function documentExpiring(
	transaction: Transaction,
	notice: DocumentExpiringNotice
): Promise<void> {
	const recipients = await User.sequelize!.query<Recipient>(
		`SELECT id, name, email FROM users
		  WHERE NOT disabled AND (role = 'coordinator' OR id = :uploader)
		  ORDER BY email`,
		{ type: QueryTypes.SELECT, transaction, replacements: { uploader: notice.uploadedByUserId } }
	);
	const origin = mailOrigin();
	const owner =
		'shipmentReference' in notice.owner
			? `shipment ${notice.owner.shipmentReference}`
			: `product ${notice.owner.productSku}`;
	await enqueueForEach(
		transaction,
		recipients,
		'document_reminder',
		`${notice.documentId}:${notice.expiresOn}`,
		(r) =>
			documentReminderMail({
				origin,
				name: r.name,
				kindLabel: notice.kindLabel,
				title: notice.title,
				expiresOn: notice.expiresOn,
				daysLeft: notice.daysLeft,
				owner,
				link: origin + notice.path
			})
	);
}
