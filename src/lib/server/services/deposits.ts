/**
 * Freight deposits: finance or a coordinator requests one on a shipment, the customer pays it
 * through Stripe Checkout, finance refunds it. The app learns of a payment only from verified
 * webhooks (deposit-events.ts); this file never marks a deposit paid.
 */
import { QueryTypes, type Transaction } from 'sequelize';
import type Stripe from 'stripe';
import { formatMinor, percentOfMinor, toMinor } from '../../deposits/minor-units';
import {
	canCancel,
	canPay,
	canRefund,
	type DepositFacts,
	type DepositState
} from '../../deposits/states';
import type { DepositRequestInput } from '../../schemas/deposits';
import type { TransportMode } from '../../landed-cost/types';
import type { SessionUser } from '../auth/session-user';
import { Shipment } from '../db/models';
import { payments, PaymentsNotConfigured } from '../payments/stripe-client';
import { recordAudit } from './audit';
import { depositRefunded, depositRequested, type DepositNotice } from './deposit-notices';
import { shipmentLandedCost } from './landed-cost/compute';
import { getShipment } from './shipment-detail';
import { refused, type ServiceResult } from './result';

const sequelize = () => Shipment.sequelize!;

/** Who requests and cancels deposits; only finance refunds. */
export const DEPOSIT_REQUESTERS = ['finance', 'coordinator'] as const;
const mayRequest = (u: SessionUser) => (DEPOSIT_REQUESTERS as readonly string[]).includes(u.role);
const mayRefund = (u: SessionUser) => u.role === 'finance';
const mayRead = (u: SessionUser) => u.role !== 'broker';

/** Today as 'YYYY-MM-DD' (UTC): a deposit is payable through its due date. */
export const today = () => new Date().toISOString().slice(0, 10);

/** A deposit row as the panels and the API show it. Amounts in minor units are strings. */
export interface DepositView {
	id: string;
	shipmentId: string;
	shipmentReference: string;
	amountMinor: string;
	currency: string;
	/** e.g. 'EUR 1,250.00'. */
	amount: string;
	basis: 'amount' | 'percent';
	percent: string | null;
	/** The freight estimate a percent deposit was computed from. */
	estimate: { amount: string; currency: string; mode: TransportMode; date: string } | null;
	dueDate: string;
	note: string | null;
	state: DepositState;
	paidAmount: string | null;
	paidAt: string | null;
	refundedAt: string | null;
	/** Staff only: why a payment was not accepted as it came. */
	mismatchReason: string | null;
	/** The last declined attempt, in the payment provider's words. */
	lastFailure: string | null;
	requestedBy: string | null;
	createdAt: string;
	version: number;
	canPay: boolean;
	canCancel: boolean;
	canRefund: boolean;
}

export interface DepositRow extends DepositFacts {
	id: string;
	shipmentId: string;
	shipmentReference: string;
	organizationId: string;
	amountMinor: string;
	currency: string;
	basis: 'amount' | 'percent';
	percent: string | null;
	estimateAmount: string | null;
	estimateCurrency: string | null;
	estimateMode: TransportMode | null;
	estimateDate: string | null;
	note: string | null;
	checkoutSessionId: string | null;
	checkoutUrl: string | null;
	paidAmountMinor: string | null;
	paidCurrency: string | null;
	paidAt: Date | null;
	lastFailure: string | null;
	refundedAt: Date | null;
	requestedBy: string | null;
	createdAt: Date;
	version: number;
}

export const DEPOSIT_COLUMNS = `
	d.id, d.shipment_id AS "shipmentId", s.reference AS "shipmentReference",
	d.organization_id AS "organizationId", d.amount_minor::text AS "amountMinor", d.currency,
	d.basis, d.percent::text AS percent, d.estimate_amount::text AS "estimateAmount",
	d.estimate_currency AS "estimateCurrency", d.estimate_mode AS "estimateMode",
	to_char(d.estimate_date, 'YYYY-MM-DD') AS "estimateDate",
	to_char(d.due_date, 'YYYY-MM-DD') AS "dueDate", d.note, d.state,
	d.checkout_session_id AS "checkoutSessionId", d.checkout_url AS "checkoutUrl",
	d.payment_intent_id AS "paymentIntentId", d.refund_id AS "refundId",
	d.paid_amount_minor::text AS "paidAmountMinor", d.paid_currency AS "paidCurrency",
	d.paid_at AS "paidAt", d.mismatch_reason AS "mismatchReason", d.last_failure AS "lastFailure",
	d.refunded_at AS "refundedAt", u.name AS "requestedBy", d.created_at AS "createdAt", d.version`;
const FROM = `FROM deposits d JOIN shipments s ON s.id = d.shipment_id
	LEFT JOIN users u ON u.id = d.requested_by`;

/** Customers see their own organization's deposits only: the condition is in the SQL itself. */
function scope(user: SessionUser): { sql: string; replacements: Record<string, string> } {
	if (user.role === 'customer')
		return {
			sql: 'd.organization_id = :scopeOrg AND s.customer_id = :scopeOrg',
			replacements: { scopeOrg: user.organizationId }
		};
	return { sql: 'TRUE', replacements: {} };
}

/**
 * The deposit a button names, on the shipment whose page the button is on: one of another
 * shipment is not found, like one of another organization (no id works out of its place).
 */
async function findDeposit(
	user: SessionUser,
	shipmentId: string,
	depositId: string,
	options: { transaction?: Transaction; lock?: boolean } = {}
): Promise<DepositRow | null> {
	const s = scope(user);
	const [row] = await sequelize().query<DepositRow>(
		`SELECT ${DEPOSIT_COLUMNS} ${FROM}
		  WHERE d.id = :depositId AND d.shipment_id = :shipmentId AND ${s.sql}
		 ${options.lock ? 'FOR UPDATE OF d' : ''}`,
		{
			type: QueryTypes.SELECT,
			replacements: { depositId, shipmentId, ...s.replacements },
			transaction: options.transaction
		}
	);
	return row ?? null;
}

/** Webhooks act for no user: the deposit named by id or by its payment, row-locked. */
export async function lockDepositFor(
	by: 'id' | 'paymentIntent',
	value: string,
	transaction: Transaction
): Promise<DepositRow | null> {
	const column = by === 'id' ? 'd.id' : 'd.payment_intent_id';
	if (by === 'id' && !/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(value))
		return null;
	const [row] = await sequelize().query<DepositRow>(
		`SELECT ${DEPOSIT_COLUMNS} ${FROM} WHERE ${column} = :value FOR UPDATE OF d`,
		{ type: QueryTypes.SELECT, replacements: { value }, transaction }
	);
	return row ?? null;
}

function view(user: SessionUser, d: DepositRow): DepositView {
	const staff = user.role !== 'customer';
	return {
		id: d.id,
		shipmentId: d.shipmentId,
		shipmentReference: d.shipmentReference,
		amountMinor: d.amountMinor,
		currency: d.currency,
		amount: formatMinor(d.amountMinor, d.currency),
		basis: d.basis,
		percent: d.percent === null ? null : d.percent.replace(/\.?0+$/, ''),
		estimate:
			d.estimateAmount && d.estimateCurrency && d.estimateMode && d.estimateDate
				? {
						amount: d.estimateAmount,
						currency: d.estimateCurrency,
						mode: d.estimateMode,
						date: d.estimateDate
					}
				: null,
		dueDate: d.dueDate,
		note: d.note,
		state: d.state,
		paidAmount:
			d.paidAmountMinor && d.paidCurrency ? formatMinor(d.paidAmountMinor, d.paidCurrency) : null,
		paidAt: d.paidAt ? new Date(d.paidAt).toISOString() : null,
		refundedAt: d.refundedAt ? new Date(d.refundedAt).toISOString() : null,
		mismatchReason: staff ? d.mismatchReason : null,
		lastFailure: d.lastFailure,
		requestedBy: staff ? d.requestedBy : null,
		createdAt: new Date(d.createdAt).toISOString(),
		version: d.version,
		canPay: user.role === 'customer' && canPay(d, today()),
		canCancel: mayRequest(user) && canCancel(d),
		canRefund: mayRefund(user) && canRefund(d)
	};
}

export function noticeOf(d: DepositRow): DepositNotice {
	return {
		depositId: d.id,
		shipmentId: d.shipmentId,
		shipmentReference: d.shipmentReference,
		organizationId: d.organizationId,
		amount: formatMinor(d.amountMinor, d.currency),
		dueDate: d.dueDate
	};
}

/**
 * The deposits of a shipment the user may see, newest first; null when the shipment is not
 * visible (or the role sees no deposits). Expires past-due deposits first.
 */
export async function listDeposits(
	user: SessionUser,
	shipmentId: string
): Promise<DepositView[] | null> {
	if (!mayRead(user)) return null;
	if (!(await getShipment(user, shipmentId))) return null;
	await expirePastDue();
	const s = scope(user);
	const rows = await sequelize().query<DepositRow>(
		`SELECT ${DEPOSIT_COLUMNS} ${FROM} WHERE d.shipment_id = :shipmentId AND ${s.sql}
		  ORDER BY d.created_at DESC, d.id`,
		{ type: QueryTypes.SELECT, replacements: { shipmentId, ...s.replacements } }
	);
	return rows.map((r) => view(user, r));
}

/** The freight estimate for the chosen mode in `currency`, or the field error saying why not. */
async function freightEstimate(
	user: SessionUser,
	shipmentId: string,
	mode: TransportMode | null,
	currency: string,
	date: string
): Promise<{ ok: true; amount: string; mode: TransportMode } | { ok: false; message: string }> {
	if (!mode)
		return {
			ok: false,
			message: 'The shipment has no chosen mode, so there is no freight estimate.'
		};
	const estimate = await shipmentLandedCost(user, shipmentId, mode, {
		date,
		reportCurrency: currency
	});
	if (!estimate.ok)
		return { ok: false, message: `No freight estimate can be computed: ${estimate.message}` };
	if (!estimate.result.ok) {
		const why = estimate.result.missing
			.map((m) => m.message)
			.slice(0, 3)
			.join(' ');
		return { ok: false, message: `No freight estimate can be computed for this mode. ${why}` };
	}
	const amount = estimate.result.components.freight.amount;
	if (!/[1-9]/.test(amount)) return { ok: false, message: 'The freight estimate is zero.' };
	return { ok: true, amount, mode };
}

/** Finance or a coordinator asks the shipment's customer for a deposit. */
export async function requestDeposit(
	user: SessionUser,
	shipmentId: string,
	input: DepositRequestInput,
	context: { origin: string; ip: string | null }
): Promise<ServiceResult<{ id: string; amount: string }>> {
	if (!mayRequest(user)) return refused(403, 'Only finance and coordinators request deposits.');
	const shipment = await getShipment(user, shipmentId);
	if (!shipment) return refused(404, 'No shipment with this id is visible to you.');
	if (shipment.status === 'cancelled')
		return refused(409, 'The shipment is cancelled: no deposit can be requested on it.');
	const date = today();
	if (input.dueDate < date)
		return refused(400, 'Check the highlighted fields.', {
			dueDate: 'Choose today or a later day.'
		});

	let amountMinor: bigint;
	let estimate: { amount: string; mode: TransportMode } | null = null;
	if (input.basis === 'amount') {
		const minor = toMinor(input.amount, input.currency);
		if (!minor.ok) return refused(400, 'Check the highlighted fields.', { amount: minor.message });
		amountMinor = minor.minor;
	} else {
		const found = await freightEstimate(
			user,
			shipmentId,
			shipment.chosenMode,
			input.currency,
			date
		);
		if (!found.ok) return refused(400, 'Check the highlighted fields.', { percent: found.message });
		estimate = found;
		amountMinor = percentOfMinor(found.amount, input.percent, input.currency);
		if (amountMinor <= 0n)
			return refused(400, 'Check the highlighted fields.', {
				percent: 'That percentage of the estimate rounds to nothing.'
			});
	}

	const id = await sequelize().transaction(async (transaction) => {
		const [row] = await sequelize().query<{ id: string }>(
			`INSERT INTO deposits (shipment_id, organization_id, amount_minor, currency, basis, percent,
			   estimate_amount, estimate_currency, estimate_mode, estimate_date, due_date, note,
			   requested_by)
			 VALUES (:shipmentId, :organizationId, :amountMinor, :currency, :basis, :percent,
			   :estimateAmount, :estimateCurrency, :estimateMode, :estimateDate, :dueDate, :note,
			   :userId)
			 RETURNING id`,
			{
				type: QueryTypes.SELECT,
				transaction,
				replacements: {
					shipmentId,
					organizationId: shipment.customerId,
					amountMinor: amountMinor.toString(),
					currency: input.currency,
					basis: input.basis,
					percent: estimate ? input.percent : null,
					estimateAmount: estimate?.amount ?? null,
					estimateCurrency: estimate ? input.currency : null,
					estimateMode: estimate?.mode ?? null,
					estimateDate: estimate ? date : null,
					dueDate: input.dueDate,
					note: input.note || null,
					userId: user.id
				}
			}
		);
		const depositId = row!.id;
		await recordAudit(
			{
				actorUserId: user.id,
				action: 'deposit.request',
				entity: 'deposit',
				entityId: depositId,
				after: {
					shipmentId,
					amountMinor: amountMinor.toString(),
					currency: input.currency,
					basis: input.basis
				},
				ip: context.ip
			},
			transaction
		);
		await depositRequested(transaction, {
			depositId,
			shipmentId,
			shipmentReference: shipment.reference,
			organizationId: shipment.customerId,
			amount: formatMinor(amountMinor, input.currency),
			dueDate: input.dueDate,
			note: input.note || null,
			payLink: `${context.origin}/shipments/${shipmentId}#deposits`
		});
		return depositId;
	});
	return { ok: true, value: { id, amount: formatMinor(amountMinor, input.currency) } };
}

/** Best effort: an open Checkout Session of a deposit that can no longer be paid is closed. */
async function expireSessions(sessionIds: (string | null)[]): Promise<void> {
	const open = sessionIds.filter((s): s is string => s !== null);
	if (open.length === 0) return;
	let stripe: Stripe;
	try {
		stripe = payments().stripe;
	} catch {
		return;
	}
	await Promise.allSettled(open.map((id) => stripe.checkout.sessions.expire(id)));
}

/** Requested deposits past their due date (and with no payment on them) become expired. */
export async function expirePastDue(on = today()): Promise<number> {
	const expired = await sequelize().query<{ id: string; session: string | null }>(
		`UPDATE deposits SET state = 'expired', version = version + 1, updated_at = now()
		  WHERE state = 'requested' AND due_date < :on AND payment_intent_id IS NULL
		  RETURNING id, checkout_session_id AS session`,
		{ type: QueryTypes.SELECT, replacements: { on } }
	);
	await expireSessions(expired.map((e) => e.session));
	return expired.length;
}

/** Finance or a coordinator withdraws a requested deposit that has no payment on it. */
export async function cancelDeposit(
	user: SessionUser,
	shipmentId: string,
	depositId: string,
	version: number | undefined,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!mayRequest(user)) return refused(403, 'Only finance and coordinators cancel deposits.');
	const outcome = await sequelize().transaction(async (transaction) => {
		const d = await findDeposit(user, shipmentId, depositId, { transaction, lock: true });
		if (!d) return refused(404, 'No deposit with this id is visible to you.');
		if (version !== undefined && d.version !== version)
			return refused(409, 'This deposit changed meanwhile. Reload and try again.');
		if (!canCancel(d))
			return refused(
				409,
				`A deposit that is ${d.state} or has a payment on it cannot be cancelled.`
			);
		await sequelize().query(
			`UPDATE deposits SET state = 'cancelled', version = version + 1, updated_at = now()
			  WHERE id = :depositId`,
			{ replacements: { depositId }, transaction }
		);
		await recordAudit(
			{
				actorUserId: user.id,
				action: 'deposit.cancel',
				entity: 'deposit',
				entityId: depositId,
				ip
			},
			transaction
		);
		return { ok: true as const, value: { id: depositId, session: d.checkoutSessionId } };
	});
	if (!outcome.ok) return outcome;
	await expireSessions([outcome.value.session]);
	return { ok: true, value: { id: depositId } };
}

function providerRefusal(e: unknown, doing: string) {
	if (e instanceof PaymentsNotConfigured) return refused(503, e.message);
	const message = e instanceof Error ? e.message : String(e);
	return refused(502, `The payment provider refused to ${doing}: ${message}`);
}

/**
 * The customer's Pay button: a Stripe Checkout Session for the deposit (an open one is reused),
 * created with an idempotency key and metadata naming the deposit. Returns the hosted page's url.
 */
export async function startCheckout(
	user: SessionUser,
	shipmentId: string,
	depositId: string,
	origin: string
): Promise<ServiceResult<{ url: string }>> {
	if (user.role !== 'customer') return refused(403, 'Only the customer pays a deposit.');
	await expirePastDue();
	const d = await findDeposit(user, shipmentId, depositId);
	if (!d) return refused(404, 'No deposit with this id is visible to you.');
	if (!canPay(d, today())) {
		if (d.state === 'requested' && (d.paymentIntentId || d.mismatchReason))
			return refused(409, 'A payment for this deposit has been received; it is being checked.');
		return refused(409, `This deposit is ${d.state} and cannot be paid.`);
	}
	let stripe: Stripe;
	try {
		stripe = payments().stripe;
	} catch (e) {
		return providerRefusal(e, 'start the payment');
	}
	try {
		if (d.checkoutSessionId) {
			const existing = await stripe.checkout.sessions.retrieve(d.checkoutSessionId);
			if (existing.status === 'open' && existing.url)
				return { ok: true, value: { url: existing.url } };
			if (existing.status === 'complete')
				return refused(409, 'This deposit has been paid; the confirmation is on its way.');
		}
		const amount = Number(d.amountMinor);
		if (!Number.isSafeInteger(amount))
			return refused(400, 'The deposit amount is too large to pay by card.');
		const metadata = {
			deposit_id: d.id,
			shipment_id: d.shipmentId,
			shipment_reference: d.shipmentReference,
			amount_minor: d.amountMinor,
			currency: d.currency
		};
		const back = `${origin}/shipments/${d.shipmentId}/deposits/${d.id}`;
		const session = await stripe.checkout.sessions.create(
			{
				mode: 'payment',
				line_items: [
					{
						quantity: 1,
						price_data: {
							currency: d.currency.toLowerCase(),
							unit_amount: amount,
							product_data: {
								name: `Freight deposit, shipment ${d.shipmentReference}`,
								...(d.note ? { description: d.note } : {})
							}
						}
					}
				],
				client_reference_id: d.id,
				customer_email: user.email,
				metadata,
				payment_intent_data: { metadata },
				success_url: `${back}/paid?session_id={CHECKOUT_SESSION_ID}`,
				cancel_url: `${back}/not-paid`
			},
			// One key per deposit version: a double click gets the same session back.
			{ idempotencyKey: `landfall-deposit-${d.id}-checkout-v${d.version}` }
		);
		if (!session.url) return refused(502, 'The payment provider gave no payment page.');
		const updated = await sequelize().query<{ id: string }>(
			`UPDATE deposits SET checkout_session_id = :sessionId, checkout_url = :url,
			        version = version + 1, updated_at = now()
			  WHERE id = :depositId AND version = :version AND state = 'requested'
			  RETURNING id`,
			{
				type: QueryTypes.SELECT,
				replacements: { sessionId: session.id, url: session.url, depositId, version: d.version }
			}
		);
		if (updated.length === 0) {
			// A concurrent click stored its session first: send this customer to that one.
			const again = await findDeposit(user, shipmentId, depositId);
			if (again?.checkoutUrl && again.state === 'requested')
				return { ok: true, value: { url: again.checkoutUrl } };
			return refused(409, 'This deposit changed meanwhile. Reload and try again.');
		}
		return { ok: true, value: { url: session.url } };
	} catch (e) {
		return providerRefusal(e, 'start the payment');
	}
}

/** Finance returns a paid deposit (or a flagged payment) to the customer through Stripe. */
export async function refundDeposit(
	user: SessionUser,
	shipmentId: string,
	depositId: string,
	version: number | undefined,
	ip: string | null
): Promise<ServiceResult<{ id: string; refundId: string }>> {
	if (!mayRefund(user)) return refused(403, 'Only finance refunds deposits.');
	const d = await findDeposit(user, shipmentId, depositId);
	if (!d) return refused(404, 'No deposit with this id is visible to you.');
	if (version !== undefined && d.version !== version)
		return refused(409, 'This deposit changed meanwhile. Reload and try again.');
	if (!canRefund(d) || !d.paymentIntentId || !d.paidAmountMinor)
		return refused(
			409,
			`A deposit that is ${d.state} with no payment to return cannot be refunded.`
		);
	let refund: Stripe.Refund;
	try {
		refund = await payments().stripe.refunds.create(
			{
				payment_intent: d.paymentIntentId,
				amount: Number(d.paidAmountMinor),
				reason: 'requested_by_customer',
				metadata: { deposit_id: d.id, shipment_reference: d.shipmentReference }
			},
			{ idempotencyKey: `landfall-deposit-${d.id}-refund` }
		);
	} catch (e) {
		return providerRefusal(e, 'refund');
	}
	await sequelize().transaction(async (transaction) => {
		const changed = await markRefunded(d.id, refund.id, transaction);
		if (!changed) return; // the refund's webhook recorded it first
		await recordAudit(
			{
				actorUserId: user.id,
				action: 'deposit.refund',
				entity: 'deposit',
				entityId: d.id,
				after: { refundId: refund.id, amountMinor: String(refund.amount) },
				ip
			},
			transaction
		);
	});
	return { ok: true, value: { id: d.id, refundId: refund.id } };
}

/**
 * Records a refund once (from the Refund button or the refund's webhook, whichever comes first)
 * and queues the refund notice in the same transaction. False when it was already recorded.
 */
export async function markRefunded(
	depositId: string,
	refundId: string,
	transaction: Transaction
): Promise<boolean> {
	const [row] = await sequelize().query<DepositRow>(
		`UPDATE deposits d SET state = 'refunded', refund_id = :refundId, refunded_at = now(),
		        version = d.version + 1, updated_at = now()
		   FROM shipments s WHERE s.id = d.shipment_id AND d.id = :depositId AND d.refund_id IS NULL
		 RETURNING ${DEPOSIT_COLUMNS.replace('u.name AS "requestedBy"', 'NULL AS "requestedBy"')}`,
		{ type: QueryTypes.SELECT, replacements: { depositId, refundId }, transaction }
	);
	if (!row) return false;
	await depositRefunded(transaction, {
		...noticeOf(row),
		refundId,
		refunded: formatMinor(row.paidAmountMinor ?? row.amountMinor, row.paidCurrency ?? row.currency)
	});
	return true;
}

/** One deposit of a shipment as `listDeposits` shows it, or null when not visible. */
export async function getDeposit(
	user: SessionUser,
	shipmentId: string,
	depositId: string
): Promise<DepositView | null> {
	return (await listDeposits(user, shipmentId))?.find((d) => d.id === depositId) ?? null;
}
