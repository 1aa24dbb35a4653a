/**
 * Receipts for paid deposits: the paying customer's users, finance and coordinators (and
 * administrators) may open one. A customer's query is limited to its own organization in the
 * SQL itself; brokers see no deposits at all.
 */
import { QueryTypes } from 'sequelize';
import { formatMinor } from '../../deposits/minor-units';
import type { SessionUser } from '../auth/session-user';
import { Shipment } from '../db/models';

const READERS = ['customer', 'finance', 'coordinator', 'admin'];

export interface DepositReceipt {
	depositId: string;
	shipmentId: string;
	shipmentReference: string;
	payer: string;
	/** e.g. 'EUR 1,250.00'. */
	amount: string;
	currency: string;
	paidAt: string;
	paymentReference: string;
	refundedAt: string | null;
	refundReference: string | null;
}

interface Row {
	depositId: string;
	shipmentId: string;
	shipmentReference: string;
	payer: string;
	paidAmountMinor: string;
	paidCurrency: string;
	paidAt: Date;
	paymentIntentId: string;
	refundedAt: Date | null;
	refundId: string | null;
}

/** The receipt of a paid (or since refunded) deposit, or null when there is none for this user. */
export async function depositReceipt(
	user: SessionUser,
	shipmentId: string,
	depositId: string
): Promise<DepositReceipt | null> {
	if (!READERS.includes(user.role)) return null;
	const customer = user.role === 'customer';
	const [row] = await Shipment.sequelize!.query<Row>(
		`SELECT d.id AS "depositId", s.id AS "shipmentId", s.reference AS "shipmentReference",
		        o.name AS payer, d.paid_amount_minor::text AS "paidAmountMinor", d.paid_currency AS "paidCurrency",
		        d.paid_at AS "paidAt", d.payment_intent_id AS "paymentIntentId",
		        d.refunded_at AS "refundedAt", d.refund_id AS "refundId"
		   FROM deposits d
		   JOIN shipments s ON s.id = d.shipment_id
		   JOIN organizations o ON o.id = d.organization_id
		  WHERE d.id = :depositId AND d.shipment_id = :shipmentId
		    AND d.state IN ('paid', 'refunded') AND d.paid_at IS NOT NULL
		    AND d.payment_intent_id IS NOT NULL AND d.paid_amount_minor IS NOT NULL
		    ${customer ? 'AND d.organization_id = :org AND s.customer_id = :org' : ''}`,
		{
			type: QueryTypes.SELECT,
			replacements: { depositId, shipmentId, org: customer ? user.organizationId : null }
		}
	);
	if (!row) return null;
	return {
		depositId: row.depositId,
		shipmentId: row.shipmentId,
		shipmentReference: row.shipmentReference,
		payer: row.payer,
		amount: formatMinor(row.paidAmountMinor, row.paidCurrency),
		currency: row.paidCurrency,
		paidAt: new Date(row.paidAt).toISOString(),
		paymentReference: row.paymentIntentId,
		refundedAt: row.refundedAt ? new Date(row.refundedAt).toISOString() : null,
		refundReference: row.refundId
	};
}
