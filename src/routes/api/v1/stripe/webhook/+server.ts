import { json } from '@sveltejs/kit';
import { PaymentsNotConfigured } from '$lib/server/payments/stripe-client';
import { applyStripeEvent, verifyStripeEvent } from '$lib/server/services/deposit-events';
import { eventShapeIssues } from '$lib/server/services/stripe-event-shape';
import type { RequestHandler } from './$types';

// Stripe's webhook: no session, the signature is the proof. The raw body is verified with
// constructEvent before anything is read from it; a bad signature is a 400 and changes nothing.
// A signed event not in Stripe's shape is a 400 naming the fields, and changes nothing.
// Each event id is applied once (deposit-events.ts); a failure answers 503 so Stripe retries.
export const POST: RequestHandler = async ({ request }) => {
	const raw = await request.text();
	let event;
	try {
		event = verifyStripeEvent(raw, request.headers.get('stripe-signature'));
	} catch (e) {
		if (e instanceof PaymentsNotConfigured)
			return json({ message: e.message, code: 'unavailable' }, { status: 503 });
		throw e;
	}
	if (!event)
		return json(
			{
				message: 'The Stripe-Signature header does not match this body and the webhook secret.',
				code: 'bad_signature'
			},
			{ status: 400 }
		);
	const issues = eventShapeIssues(event);
	if (issues.length > 0)
		return json(
			{
				message: 'The event is signed but not in the shape Stripe sends; nothing was applied.',
				code: 'invalid_event',
				issues
			},
			{ status: 400 }
		);
	try {
		const result = await applyStripeEvent(event);
		return json({ received: true, ...result });
	} catch (e) {
		console.error(`[stripe webhook] ${event.id} (${event.type}) could not be applied`, e);
		return json(
			{ message: 'The event could not be applied now; it will be retried.', code: 'unavailable' },
			{ status: 503 }
		);
	}
};
