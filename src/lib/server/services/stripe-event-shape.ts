/**
 * The shape of the Stripe events Landfall applies, checked after the signature and before
 * anything is read. Stripe always sends these fields with these types; a signed event that does
 * not (a bug on either side, or a leaked webhook secret) is refused with the paths of what is
 * wrong, so it can neither fail half-way in the database nor be retried for ever as a 503. Only
 * the fields deposit-events.ts reads are checked; the rest of Stripe's object passes through.
 */
import { z } from 'zod';
import { NUL_MESSAGE, nulPaths } from '../../schemas/nul-text';

const text = z.string().max(5_000);
const stripeId = z.string().min(1).max(255);
const metadata = z.looseObject({ deposit_id: z.string().max(255).optional() }).nullish();
/** An expandable reference: the id, or the object with its id. */
const reference = z.union([stripeId, z.looseObject({ id: stripeId })]).nullish();
const minorUnits = z.number().int().min(0).max(Number.MAX_SAFE_INTEGER);
const currency = z.string().regex(/^[A-Za-z]{3}$/, { error: 'Expected a 3-letter currency code.' });

const session = z.looseObject({
	id: stripeId,
	metadata,
	payment_status: z.string().max(100).nullish(),
	payment_intent: reference,
	amount_total: minorUnits.nullish(),
	currency: currency.nullish()
});
const OBJECTS: Record<string, z.ZodType> = {
	'checkout.session.completed': session,
	'checkout.session.expired': session,
	'payment_intent.payment_failed': z.looseObject({
		id: stripeId,
		metadata,
		last_payment_error: z.looseObject({ message: text.nullish() }).nullish()
	}),
	'refund.created': z.looseObject({
		id: stripeId,
		payment_intent: reference,
		status: z.string().max(100).nullish(),
		amount: minorUnits,
		currency
	}),
	'charge.refunded': z.looseObject({ id: stripeId, payment_intent: reference })
};

const envelope = z.looseObject({
	id: z.string().regex(/^evt_[A-Za-z0-9_]{1,250}$/, { error: 'Expected a Stripe event id.' }),
	type: z.string().min(1).max(255),
	data: z.looseObject({ object: z.looseObject({}) })
});

export interface ShapeIssue {
	path: string;
	message: string;
}

/** What is wrong with the event's shape; empty when Landfall can apply it. */
export function eventShapeIssues(event: unknown): ShapeIssue[] {
	const at = (prefix: string[]) => (issue: z.core.$ZodIssue) => ({
		path: [...prefix, ...issue.path.map(String)].join('.'),
		message: issue.message
	});
	const outer = envelope.safeParse(event);
	if (!outer.success) return outer.error.issues.map(at([]));
	const schema = OBJECTS[outer.data.type];
	if (schema) {
		const inner = schema.safeParse(outer.data.data.object);
		if (!inner.success) return inner.error.issues.map(at(['data', 'object']));
	}
	return nulPaths(event).map((path) => ({
		path: path.map(String).join('.'),
		message: NUL_MESSAGE
	}));
}
