/**
 * Deposit e-mails. Each function is called inside the transaction that makes the change and
 * writes to the mail outbox with it, so a notice is queued exactly when the change commits.
 * They go to the enabled customer users of the paying organization, one message each.
 */
import type { Transaction } from 'sequelize';
import { enqueueForEach, organizationRecipients } from '../mail/outbox';
import { mailDate, mailOrigin } from '../mail/origin';
import {
	depositRefundedMail,
	depositRequestedMail,
	paymentReceivedMail
} from '../mail/templates/messages';

export interface DepositNotice {
	depositId: string;
	shipmentId: string;
	shipmentReference: string;
	organizationId: string;
	/** e.g. 'EUR 1,250.00'. */
	amount: string;
	dueDate: string;
}

const customers = (transaction: Transaction, organizationId: string) =>
	organizationRecipients(transaction, organizationId, ['customer']);

/** The page of a paid deposit's receipt. */
export const receiptPath = (shipmentId: string, depositId: string) =>
	`/shipments/${shipmentId}/deposits/${depositId}/receipt`;

/** A deposit was requested: tell the customer, with the link to the page that has the Pay button. */
export async function depositRequested(
	transaction: Transaction,
	notice: DepositNotice & { payLink: string; note?: string | null }
): Promise<void> {
	const origin = new URL(notice.payLink).origin;
	await enqueueForEach(
		transaction,
		await customers(transaction, notice.organizationId),
		'deposit_requested',
		notice.depositId,
		(r) =>
			depositRequestedMail({
				origin,
				name: r.name,
				shipmentReference: notice.shipmentReference,
				amount: notice.amount,
				dueDate: notice.dueDate,
				note: notice.note ?? null,
				payLink: notice.payLink
			})
	);
}

/** The payment was received (from the webhook): a receipt to the customer. */
export async function paymentReceived(
	transaction: Transaction,
	notice: DepositNotice & { paymentIntentId: string }
): Promise<void> {
	const origin = mailOrigin();
	await enqueueForEach(
		transaction,
		await customers(transaction, notice.organizationId),
		'payment_received',
		notice.depositId,
		(r) =>
			paymentReceivedMail({
				origin,
				name: r.name,
				shipmentReference: notice.shipmentReference,
				amount: notice.amount,
				paidOn: mailDate(new Date()),
				paymentReference: notice.paymentIntentId,
				receiptLink: origin + receiptPath(notice.shipmentId, notice.depositId)
			})
	);
}

/** The deposit was refunded: tell the customer. */
export async function depositRefunded(
	transaction: Transaction,
	notice: DepositNotice & { refundId: string; refunded: string }
): Promise<void> {
	const origin = mailOrigin();
	await enqueueForEach(
		transaction,
		await customers(transaction, notice.organizationId),
		'deposit_refunded',
		notice.depositId,
		(r) =>
			depositRefundedMail({
				origin,
				name: r.name,
				shipmentReference: notice.shipmentReference,
				refunded: notice.refunded,
				refundReference: notice.refundId,
				link: `${origin}/shipments/${notice.shipmentId}#deposits`
			})
	);
}
