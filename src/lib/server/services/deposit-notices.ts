/**
 * Where deposit e-mails will be sent from. Each function is called inside the transaction that
 * makes the change, so a notice is queued exactly when the change commits. They do nothing yet:
 * the e-mail outbox (issue 7, part 2) will write its rows here with the same transaction.
 */
import type { Transaction } from 'sequelize';

export interface DepositNotice {
	depositId: string;
	shipmentId: string;
	shipmentReference: string;
	organizationId: string;
	/** e.g. 'EUR 1,250.00'. */
	amount: string;
	dueDate: string;
}

/** A deposit was requested: tell the customer, with the link to the page that has the Pay button. */
export async function depositRequested(
	_transaction: Transaction,
	_notice: DepositNotice & { payLink: string }
): Promise<void> {}

/** The payment was received (from the webhook): a receipt to the customer, a note to finance. */
export async function paymentReceived(
	_transaction: Transaction,
	_notice: DepositNotice & { paymentIntentId: string }
): Promise<void> {}

/** The deposit was refunded: tell the customer. */
export async function depositRefunded(
	_transaction: Transaction,
	_notice: DepositNotice & { refundId: string; refunded: string }
): Promise<void> {}
