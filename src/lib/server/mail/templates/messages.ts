/**
 * Landfall's e-mails: pure functions returning { subject, html, text } (see layout.ts, which
 * escapes every value). Cautions follow the project rule: money and customs mails defer to the
 * carrier's invoice, the customs authorities and a licensed customs broker.
 */
import { appLink, composeMail, type MailContent } from './layout';

export const DEPOSIT_CAUTION =
	'A freight deposit is an advance on the freight charges, not a final invoice, duty or tax ' +
	'assessment. Final charges follow the carrier’s invoice and any duties and taxes the customs ' +
	'authorities assess. Pay only through the Landfall link; we never ask for card details by e-mail.';

export const CUSTOMS_CAUTION =
	'These papers were prepared from the data in Landfall. Before lodging a declaration, have a ' +
	'licensed customs broker check them against the goods and the applicable regulations; the ' +
	'declarant remains responsible for the declaration.';

interface Base {
	origin: string;
	name: string;
}

export function invitationMail(
	m: Base & { inviter: string; organization: string; role: string; link: string; expires: string }
): MailContent {
	return composeMail({
		origin: m.origin,
		subject: 'Your Landfall sign-in: choose a password',
		heading: 'You are invited to Landfall',
		greeting: `Hello ${m.name},`,
		paragraphs: [
			`${m.inviter} has given you a Landfall sign-in for ${m.organization} (${m.role}).`,
			`Choose your password with the link below. It works once and until ${m.expires}. If you did not expect this message, you can ignore it.`
		],
		action: { label: 'Choose a password', href: m.link }
	});
}

export function bookingConfirmedMail(
	m: Base & { shipmentReference: string; shipmentId: string; route: string; incoterm: string }
): MailContent {
	return composeMail({
		origin: m.origin,
		subject: `Shipment ${m.shipmentReference} is booked`,
		heading: `Shipment ${m.shipmentReference} is booked`,
		greeting: `Hello ${m.name},`,
		paragraphs: [
			'Our export team has booked this shipment. Its journey, papers and any deposit are on its page.'
		],
		facts: [
			['Shipment', m.shipmentReference],
			['Route', m.route],
			['Incoterms® rule', m.incoterm]
		],
		action: { label: 'Open the shipment', href: appLink(m.origin, `/shipments/${m.shipmentId}`) },
		caution:
			'Dates are planned, not promised: the carrier’s schedule and customs clearance decide when the goods move.'
	});
}

export function documentsIssuedMail(
	m: Base & { shipmentReference: string; shipmentId: string; documents: string[] }
): MailContent {
	return composeMail({
		origin: m.origin,
		subject: `Papers issued for shipment ${m.shipmentReference}`,
		heading: `Papers issued for shipment ${m.shipmentReference}`,
		greeting: `Hello ${m.name},`,
		paragraphs: [
			`The export team has issued ${m.documents.length === 1 ? 'a document' : 'documents'} for this shipment: ${m.documents.join(', ')}.`,
			'You can download them from the shipment page once signed in.'
		],
		action: { label: 'Open the shipment', href: appLink(m.origin, `/shipments/${m.shipmentId}`) },
		caution: CUSTOMS_CAUTION
	});
}

export function depositRequestedMail(
	m: Base & {
		shipmentReference: string;
		amount: string;
		dueDate: string;
		note: string | null;
		payLink: string;
	}
): MailContent {
	return composeMail({
		origin: m.origin,
		subject: `Freight deposit of ${m.amount} for shipment ${m.shipmentReference}`,
		heading: 'A freight deposit is due',
		greeting: `Hello ${m.name},`,
		paragraphs: [
			`Before the cargo of shipment ${m.shipmentReference} moves, we ask for a freight deposit. Sign in and pay it by card on the shipment page.`,
			...(m.note ? [`Note from our team: ${m.note}`] : [])
		],
		facts: [
			['Shipment', m.shipmentReference],
			['Amount', m.amount],
			['Due by', m.dueDate]
		],
		action: { label: 'Pay the deposit', href: m.payLink },
		caution: DEPOSIT_CAUTION
	});
}

export function paymentReceivedMail(
	m: Base & {
		shipmentReference: string;
		amount: string;
		paidOn: string;
		paymentReference: string;
		receiptLink: string;
	}
): MailContent {
	return composeMail({
		origin: m.origin,
		subject: `Receipt: ${m.amount} received for shipment ${m.shipmentReference}`,
		heading: 'Payment received: your receipt',
		greeting: `Hello ${m.name},`,
		paragraphs: ['Thank you. We have received your freight deposit.'],
		facts: [
			['Amount', m.amount],
			['Shipment', m.shipmentReference],
			['Paid on', m.paidOn],
			['Payment reference', m.paymentReference]
		],
		action: { label: 'View the receipt', href: m.receiptLink },
		caution: DEPOSIT_CAUTION
	});
}

export function depositRefundedMail(
	m: Base & { shipmentReference: string; refunded: string; refundReference: string; link: string }
): MailContent {
	return composeMail({
		origin: m.origin,
		subject: `Refund of ${m.refunded} for shipment ${m.shipmentReference}`,
		heading: 'Your freight deposit was refunded',
		greeting: `Hello ${m.name},`,
		paragraphs: [
			'We have refunded the freight deposit below to the card it was paid with. Banks usually take a few working days to show it.'
		],
		facts: [
			['Refunded', m.refunded],
			['Shipment', m.shipmentReference],
			['Refund reference', m.refundReference]
		],
		action: { label: 'Open the shipment', href: m.link }
	});
}

export function documentExpiringMail(
	m: Base & {
		kindLabel: string;
		title: string;
		expiresOn: string;
		daysLeft: number;
		filedOn: string;
		link: string;
	}
): MailContent {
	const when =
		m.daysLeft === 0 ? 'at the end of today' : `in ${m.daysLeft} day${m.daysLeft === 1 ? '' : 's'}`;
	return composeMail({
		origin: m.origin,
		subject: `${m.kindLabel} lapses ${when}: ${m.title}`,
		heading: 'A supporting document is about to lapse',
		greeting: `Hello ${m.name},`,
		paragraphs: [
			'The document below stops counting for the checks before papers are issued once it lapses. Ask the supplier or laboratory for a current one and add it in Landfall.'
		],
		facts: [
			['Document', m.title],
			['Kind', m.kindLabel],
			['Filed on', m.filedOn],
			['Valid until', m.expiresOn]
		],
		action: { label: 'Open the documents', href: m.link }
	});
}
