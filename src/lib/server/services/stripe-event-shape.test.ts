import { describe, expect, it } from 'vitest';
import { eventShapeIssues } from './stripe-event-shape';

// Field names and types as in Stripe's API reference (docs.stripe.com/api: the Event, Checkout
// Session, PaymentIntent, Refund and Charge objects, 2026).
const session = {
	id: 'cs_test_1',
	object: 'checkout.session',
	metadata: { deposit_id: '5b1a7c52-3f0e-4c59-9d3b-0a9e6c1f2d47' },
	payment_status: 'paid',
	payment_intent: 'pi_1',
	amount_total: 32100,
	currency: 'eur'
};
const completed = (object: object) => ({
	id: 'evt_1',
	type: 'checkout.session.completed',
	data: { object }
});

describe('eventShapeIssues', () => {
	it('accepts events as Stripe sends them, an expanded payment intent too', () => {
		expect(eventShapeIssues(completed(session))).toEqual([]);
		expect(eventShapeIssues(completed({ ...session, payment_intent: { id: 'pi_1' } }))).toEqual([]);
		expect(eventShapeIssues({ id: 'evt_2', type: 'invoice.paid', data: { object: {} } })).toEqual(
			[]
		);
	});

	it('names each field Landfall would misread', () => {
		const paths = (e: unknown) => eventShapeIssues(e).map((i) => i.path);
		expect(paths(completed({ ...session, amount_total: 'abc' }))).toEqual([
			'data.object.amount_total'
		]);
		expect(paths(completed({ ...session, amount_total: 1.5 }))).toEqual([
			'data.object.amount_total'
		]);
		expect(paths(completed({ ...session, currency: 978 }))).toEqual(['data.object.currency']);
		expect(paths({ ...completed(session), id: 'abc' })).toEqual(['id']);
		expect(
			paths({ id: 'evt_3', type: 'refund.created', data: { object: { id: 're_1' } } })
		).toEqual(['data.object.amount', 'data.object.currency']);
		expect(paths(completed({ ...session, payment_status: 'pa\u0000id' }))).toEqual([
			'data.object.payment_status'
		]);
		expect(paths({ id: 'evt_4', type: 'x' })).toEqual(['data']);
	});
});
