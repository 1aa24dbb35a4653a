/**
 * Stripe webhook events applied to deposits. Each event id is inserted into stripe_events with
 * ON CONFLICT DO NOTHING in the transaction that applies it: a second delivery, even a
 * concurrent one (it waits on the first one's row), finds the id taken and changes nothing.
 * A payment that does not match its deposit is recorded and flagged, never accepted.
 */
import { QueryTypes, type Transaction } from 'sequelize';
import type Stripe from 'stripe';
import { formatMinor } from '../../deposits/minor-units';
import { canRefund } from '../../deposits/states';
import { isPaymentCurrency } from '../../reference/currencies';
import { Shipment } from '../db/models';
import { payments } from '../payments/stripe-client';
import { recordAudit } from './audit';
import { paymentReceived } from './deposit-notices';
import { lockDepositFor, markRefunded, noticeOf } from './deposits';

const sequelize = () => Shipment.sequelize!;

export interface EventOutcome {
	/** True when this event id had been handled before: nothing was changed. */
	duplicate: boolean;
	outcome: string;
	depositId: string | null;
}

/** The event, if the signature is Stripe's for this body (constructEvent); null otherwise. */
export function verifyStripeEvent(rawBody: string, signature: string | null): Stripe.Event | null {
	const { stripe, config } = payments();
	if (!signature) return null;
	try {
		return stripe.webhooks.constructEvent(rawBody, signature, config.webhookSecret);
	} catch {
		return null;
	}
}

export async function applyStripeEvent(event: Stripe.Event): Promise<EventOutcome> {
	return sequelize().transaction(async (transaction) => {
		const fresh = await sequelize().query<{ id: string }>(
			`INSERT INTO stripe_events (id, type) VALUES (:id, :type)
			 ON CONFLICT (id) DO NOTHING RETURNING id`,
			{ type: QueryTypes.SELECT, replacements: { id: event.id, type: event.type }, transaction }
		);
		if (fresh.length === 0) return { duplicate: true, outcome: 'already handled', depositId: null };
		const result = await apply(event, transaction);
		await sequelize().query(
			`UPDATE stripe_events SET handled_at = now(), outcome = :outcome, deposit_id = :depositId
			  WHERE id = :id`,
			{
				replacements: {
					id: event.id,
					outcome: result.outcome.slice(0, 500),
					depositId: result.depositId
				},
				transaction
			}
		);
		return { duplicate: false, ...result };
	});
}

type Applied = { outcome: string; depositId: string | null };

const idOf = (value: string | { id: string } | null | undefined) =>
	typeof value === 'string' ? value : (value?.id ?? null);

/** 'EUR 12.50', or the raw figures when the currency is not one Landfall knows. */
function money(minor: bigint, currency: string): string {
	return isPaymentCurrency(currency)
		? formatMinor(minor, currency)
		: `${minor} ${currency} minor units`;
}

async function apply(event: Stripe.Event, transaction: Transaction): Promise<Applied> {
	switch (event.type) {
		case 'checkout.session.completed':
			return sessionCompleted(event.data.object, transaction);
		case 'payment_intent.payment_failed':
			return paymentFailed(event.data.object, transaction);
		case 'refund.created':
			return refundCreated(event.data.object, transaction);
		case 'charge.refunded':
			return chargeRefunded(event.data.object, transaction);
		case 'checkout.session.expired':
			return sessionExpired(event.data.object, transaction);
		default:
			return { outcome: `ignored: Landfall does not use ${event.type}`, depositId: null };
	}
}

async function sessionCompleted(
	session: Stripe.Checkout.Session,
	transaction: Transaction
): Promise<Applied> {
	const d = await lockDepositFor('id', session.metadata?.deposit_id ?? '', transaction);
	if (!d) return { outcome: 'ignored: the session names no deposit of Landfall', depositId: null };
	const at = { depositId: d.id };
	if (session.payment_status !== 'paid')
		return { outcome: `not paid yet (${session.payment_status})`, ...at };
	const intent = idOf(session.payment_intent);
	if (!intent) return { outcome: 'ignored: the session has no payment', ...at };
	if (d.paymentIntentId === intent) return { outcome: 'already recorded', ...at };

	const paid = BigInt(session.amount_total ?? 0);
	const currency = (session.currency ?? '').toUpperCase();
	const problems: string[] = [];
	if (d.paymentIntentId)
		problems.push(
			`A second payment (${intent}, ${money(paid, currency)}) arrived after ${d.paymentIntentId}: return it in Stripe.`
		);
	else {
		if (currency !== d.currency || paid !== BigInt(d.amountMinor))
			problems.push(
				`Received ${money(paid, currency)} where ${money(BigInt(d.amountMinor), d.currency)} was requested.`
			);
		if (d.state !== 'requested') problems.push(`Paid after the deposit was ${d.state}.`);
	}

	if (problems.length > 0) {
		const reason = [d.mismatchReason, ...problems].filter(Boolean).join(' ').slice(0, 500);
		await sequelize().query(
			`UPDATE deposits SET mismatch_reason = :reason, version = version + 1, updated_at = now(),
			        payment_intent_id = COALESCE(payment_intent_id, :intent),
			        paid_amount_minor = COALESCE(paid_amount_minor, :paid),
			        paid_currency = COALESCE(paid_currency, :currency),
			        paid_at = COALESCE(paid_at, now())
			  WHERE id = :id`,
			{
				replacements: {
					id: d.id,
					reason,
					intent,
					paid: paid.toString(),
					currency: /^[A-Z]{3}$/.test(currency) ? currency : null
				},
				transaction
			}
		);
		return { outcome: `flagged: ${problems.join(' ')}`, ...at };
	}

	await sequelize().query(
		`UPDATE deposits SET state = 'paid', payment_intent_id = :intent, paid_amount_minor = :paid,
		        paid_currency = :currency, paid_at = now(), last_failure = NULL,
		        version = version + 1, updated_at = now()
		  WHERE id = :id`,
		{ replacements: { id: d.id, intent, paid: paid.toString(), currency }, transaction }
	);
	await recordAudit(
		{
			actorUserId: null,
			action: 'deposit.paid',
			entity: 'deposit',
			entityId: d.id,
			after: { paymentIntentId: intent, amountMinor: paid.toString(), currency }
		},
		transaction
	);
	await paymentReceived(transaction, { ...noticeOf(d), paymentIntentId: intent });
	return { outcome: 'paid', ...at };
}

async function paymentFailed(
	intent: Stripe.PaymentIntent,
	transaction: Transaction
): Promise<Applied> {
	const d = await lockDepositFor('id', intent.metadata?.deposit_id ?? '', transaction);
	if (!d) return { outcome: 'ignored: the payment names no deposit of Landfall', depositId: null };
	const message = (intent.last_payment_error?.message ?? 'The payment failed.').slice(0, 500);
	if (d.state === 'requested' && !d.paymentIntentId)
		await sequelize().query(
			`UPDATE deposits SET last_failure = :message, version = version + 1, updated_at = now()
			  WHERE id = :id`,
			{ replacements: { id: d.id, message }, transaction }
		);
	return { outcome: `declined: ${message}`, depositId: d.id };
}

async function refundCreated(refund: Stripe.Refund, transaction: Transaction): Promise<Applied> {
	const intent = idOf(refund.payment_intent);
	const d = intent ? await lockDepositFor('paymentIntent', intent, transaction) : null;
	if (!d) return { outcome: 'ignored: no deposit has this payment', depositId: null };
	const at = { depositId: d.id };
	if (d.refundId === refund.id) return { outcome: 'already recorded', ...at };
	if (refund.status === 'failed' || refund.status === 'canceled')
		return { outcome: `refund ${refund.status}`, ...at };
	if (d.refundId || BigInt(refund.amount) !== BigInt(d.paidAmountMinor ?? -1) || !canRefund(d)) {
		const reason = [
			d.mismatchReason,
			`A refund (${refund.id}, ${money(BigInt(refund.amount), refund.currency.toUpperCase())}) was made outside Landfall; check it in Stripe.`
		]
			.filter(Boolean)
			.join(' ')
			.slice(0, 500);
		await sequelize().query(
			`UPDATE deposits SET mismatch_reason = :reason, version = version + 1, updated_at = now()
			  WHERE id = :id`,
			{ replacements: { id: d.id, reason }, transaction }
		);
		return { outcome: 'flagged: refund does not match the payment', ...at };
	}
	await markRefunded(d.id, refund.id, transaction);
	return { outcome: 'refunded', ...at };
}

async function chargeRefunded(charge: Stripe.Charge, transaction: Transaction): Promise<Applied> {
	const intent = idOf(charge.payment_intent);
	const d = intent ? await lockDepositFor('paymentIntent', intent, transaction) : null;
	if (!d) return { outcome: 'ignored: no deposit has this payment', depositId: null };
	return {
		outcome: d.refundId ? 'refund confirmed' : 'refund noted; recorded from refund.created',
		depositId: d.id
	};
}

async function sessionExpired(
	session: Stripe.Checkout.Session,
	transaction: Transaction
): Promise<Applied> {
	const d = await lockDepositFor('id', session.metadata?.deposit_id ?? '', transaction);
	if (!d) return { outcome: 'ignored: the session names no deposit of Landfall', depositId: null };
	if (d.checkoutSessionId === session.id)
		await sequelize().query(
			`UPDATE deposits SET checkout_session_id = NULL, checkout_url = NULL,
			        version = version + 1, updated_at = now()
			  WHERE id = :id`,
			{ replacements: { id: d.id }, transaction }
		);
	return { outcome: 'session expired', depositId: d.id };
}
