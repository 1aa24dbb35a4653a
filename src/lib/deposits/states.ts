/**
 * The life of a freight deposit. Pure: the services apply it inside their transactions, the
 * panels use it to decide which buttons to show.
 *
 *   requested ──paid──▶ paid ──refund──▶ refunded
 *       ├──expire──▶ expired
 *       └──cancel──▶ cancelled
 *
 * A payment that does not match the deposit (wrong amount or currency, or paid after it was
 * cancelled or expired) is flagged and leaves the state as it was; finance can refund that
 * money too, which ends the deposit as refunded.
 */

export const DEPOSIT_STATES = ['requested', 'paid', 'expired', 'cancelled', 'refunded'] as const;
export type DepositState = (typeof DEPOSIT_STATES)[number];

export type DepositEvent = 'pay' | 'expire' | 'cancel' | 'refund';

export const DEPOSIT_STATE_LABELS: Record<DepositState, string> = {
	requested: 'Requested',
	paid: 'Paid',
	expired: 'Expired',
	cancelled: 'Cancelled',
	refunded: 'Refunded'
};

const TRANSITIONS: Record<DepositState, Partial<Record<DepositEvent, DepositState>>> = {
	requested: { pay: 'paid', expire: 'expired', cancel: 'cancelled', refund: 'refunded' },
	paid: { refund: 'refunded' },
	expired: { refund: 'refunded' },
	cancelled: { refund: 'refunded' },
	refunded: {}
};

export function isDepositState(value: unknown): value is DepositState {
	return typeof value === 'string' && (DEPOSIT_STATES as readonly string[]).includes(value);
}

/** The state after `event`, or null when the event is not allowed from `state`. */
export function nextState(state: DepositState, event: DepositEvent): DepositState | null {
	return TRANSITIONS[state][event] ?? null;
}

/** The part of a deposit the rules below look at. */
export interface DepositFacts {
	state: DepositState;
	/** 'YYYY-MM-DD'. */
	dueDate: string;
	paymentIntentId: string | null;
	refundId: string | null;
	mismatchReason: string | null;
}

/** A requested deposit whose due date is before `today` ('YYYY-MM-DD') is expired. */
export function isPastDue(d: Pick<DepositFacts, 'state' | 'dueDate'>, today: string): boolean {
	return d.state === 'requested' && d.dueDate < today;
}

/** The customer may pay while it is requested, not past due and no payment is on it yet. */
export function canPay(d: DepositFacts, today: string): boolean {
	return (
		d.state === 'requested' &&
		!isPastDue(d, today) &&
		d.paymentIntentId === null &&
		d.mismatchReason === null
	);
}

/** Staff may cancel a requested deposit that has received no payment. */
export function canCancel(d: DepositFacts): boolean {
	return nextState(d.state, 'cancel') !== null && d.paymentIntentId === null;
}

/**
 * Finance may refund a paid deposit, or money that arrived but was flagged (wrong amount, or
 * paid after the deposit was cancelled or expired); never twice.
 */
export function canRefund(d: DepositFacts): boolean {
	if (d.paymentIntentId === null || d.refundId !== null) return false;
	if (nextState(d.state, 'refund') === null) return false;
	return d.state === 'paid' || d.mismatchReason !== null;
}
