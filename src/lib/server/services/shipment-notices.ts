/**
 * Shipment e-mails, queued in the transaction that makes the change (see mail/outbox.ts):
 * the booking confirmation to the customer's users, and "papers issued" to the users of the
 * shipment's customs broker.
 */
import { QueryTypes, type Transaction } from 'sequelize';
import { DOCUMENT_TITLES, type DocumentKind } from '../../documents/types';
import { Shipment } from '../db/models';
import { enqueueForEach, organizationRecipients } from '../mail/outbox';
import { mailOrigin } from '../mail/origin';
import { bookingConfirmedMail, documentsIssuedMail } from '../mail/templates/messages';

interface Facts {
	reference: string;
	customerId: string;
	brokerId: string | null;
	incoterm: string;
	incotermPlace: string;
	route: string;
}

const facts = async (transaction: Transaction, shipmentId: string) => {
	const [row] = await Shipment.sequelize!.query<Facts>(
		`SELECT s.reference, s.customer_id AS "customerId", s.broker_id AS "brokerId", s.incoterm,
		        s.incoterm_place AS "incotermPlace",
		        o.name || ' (' || o.code || ') to ' || d.name || ' (' || d.code || ')' AS route
		   FROM shipments s JOIN places o ON o.id = s.origin_id JOIN places d ON d.id = s.destination_id
		  WHERE s.id = :shipmentId`,
		{ type: QueryTypes.SELECT, transaction, replacements: { shipmentId } }
	);
	return row!;
};

/** The shipment went from draft to booked. */
export async function shipmentBooked(transaction: Transaction, shipmentId: string): Promise<void> {
	const s = await facts(transaction, shipmentId);
	const origin = mailOrigin();
	await enqueueForEach(
		transaction,
		await organizationRecipients(transaction, s.customerId, ['customer']),
		'booking_confirmed',
		shipmentId,
		(r) =>
			bookingConfirmedMail({
				origin,
				name: r.name,
				shipmentId,
				shipmentReference: s.reference,
				route: s.route,
				incoterm: `${s.incoterm} ${s.incotermPlace}`
			})
	);
}

/** Papers were issued (or reissued): one message per issue, keyed by the papers' numbers. */
export async function papersIssued(
	transaction: Transaction,
	shipmentId: string,
	papers: { kind: DocumentKind; number: string; revision: string }[]
): Promise<void> {
	const s = await facts(transaction, shipmentId);
	if (!s.brokerId || papers.length === 0) return;
	const origin = mailOrigin();
	const key = papers.map((p) => `${p.number}.${p.revision}`).join('+');
	await enqueueForEach(
		transaction,
		await organizationRecipients(transaction, s.brokerId, ['broker']),
		'documents_issued',
		`${shipmentId}:${key}`,
		(r) =>
			documentsIssuedMail({
				origin,
				name: r.name,
				shipmentId,
				shipmentReference: s.reference,
				documents: papers.map((p) => `${DOCUMENT_TITLES[p.kind]} ${p.number} rev. ${p.revision}`)
			})
	);
}
