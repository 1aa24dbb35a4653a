import { describe, expect, it } from 'vitest';
import {
	DEPOSIT_STATES,
	canCancel,
	canPay,
	canRefund,
	isPastDue,
	nextState,
	type DepositFacts
} from './states';

// The deposit life cycle as the issue describes it (requested → paid, or expired / cancelled /
// refunded); the flagged-payment rules are Landfall's own.
const base: DepositFacts = {
	state: 'requested',
	dueDate: '2026-12-10',
	paymentIntentId: null,
	refundId: null,
	mismatchReason: null
};

describe('deposit states', () => {
	it('moves requested to paid, expired or cancelled, and paid to refunded', () => {
		expect(nextState('requested', 'pay')).toBe('paid');
		expect(nextState('requested', 'expire')).toBe('expired');
		expect(nextState('requested', 'cancel')).toBe('cancelled');
		expect(nextState('paid', 'refund')).toBe('refunded');
	});

	it('refuses everything else', () => {
		expect(nextState('paid', 'pay')).toBeNull();
		expect(nextState('paid', 'cancel')).toBeNull();
		expect(nextState('paid', 'expire')).toBeNull();
		expect(nextState('expired', 'pay')).toBeNull();
		expect(nextState('cancelled', 'pay')).toBeNull();
		for (const event of ['pay', 'expire', 'cancel', 'refund'] as const)
			expect(nextState('refunded', event), event).toBeNull();
	});

	it('knows each state once', () => {
		expect(new Set(DEPOSIT_STATES).size).toBe(5);
	});
});

describe('what may be done to a deposit', () => {
	it('is past due only after its due date, and only while requested', () => {
		expect(isPastDue(base, '2026-12-10')).toBe(false);
		expect(isPastDue(base, '2026-12-11')).toBe(true);
		expect(isPastDue({ ...base, state: 'paid' }, '2027-01-01')).toBe(false);
	});

	it('can be paid while requested, not past due and without a payment on it', () => {
		expect(canPay(base, '2026-12-02')).toBe(true);
		expect(canPay(base, '2026-12-11')).toBe(false);
		expect(canPay({ ...base, state: 'cancelled' }, '2026-12-02')).toBe(false);
		expect(canPay({ ...base, paymentIntentId: 'pi_1' }, '2026-12-02')).toBe(false);
		expect(canPay({ ...base, mismatchReason: 'amount' }, '2026-12-02')).toBe(false);
	});

	it('can be cancelled while requested and unpaid', () => {
		expect(canCancel(base)).toBe(true);
		expect(canCancel({ ...base, state: 'paid', paymentIntentId: 'pi_1' })).toBe(false);
		expect(canCancel({ ...base, paymentIntentId: 'pi_1', mismatchReason: 'amount' })).toBe(false);
	});

	it('can be refunded once when paid, or when a flagged payment arrived', () => {
		const paid = { ...base, state: 'paid' as const, paymentIntentId: 'pi_1' };
		expect(canRefund(paid)).toBe(true);
		expect(canRefund({ ...paid, refundId: 're_1' })).toBe(false);
		expect(canRefund({ ...paid, state: 'refunded' })).toBe(false);
		expect(canRefund(base)).toBe(false);
		expect(canRefund({ ...base, paymentIntentId: 'pi_2' })).toBe(false);
		expect(canRefund({ ...base, paymentIntentId: 'pi_2', mismatchReason: 'amount' })).toBe(true);
		expect(
			canRefund({ ...base, state: 'cancelled', paymentIntentId: 'pi_3', mismatchReason: 'late' })
		).toBe(true);
	});
});
