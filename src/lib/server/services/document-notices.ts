/**
 * Where supporting-document e-mails will be sent from. Called inside the transaction that marks
 * the reminder sent, so a notice is queued exactly when that mark commits (and never twice). It
 * does nothing yet: the e-mail outbox (issue 7, part 2) will write its row here with the same
 * transaction.
 */
import type { Transaction } from 'sequelize';

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
	_transaction: Transaction,
	_notice: DocumentExpiringNotice
): Promise<void> {}
