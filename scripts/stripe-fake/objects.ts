// The Stripe objects the fake keeps in memory, shaped as the API returns them (only the fields
// Landfall and the SDK read, plus `id`, `object`, `created`, `livemode`).
import { randomBytes } from 'node:crypto';

const ALPHABET = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';

/** `cs_test_…`, `pi_…`, `re_…`, `evt_…`: a prefix and 24 random base-62 characters. */
export function newId(prefix: string): string {
	const bytes = randomBytes(24);
	return prefix + [...bytes].map((b) => ALPHABET[b % ALPHABET.length]).join('');
}

export const now = () => Math.floor(Date.now() / 1000);

export type Metadata = Record<string, string>;

export interface CheckoutSession {
	id: string;
	object: 'checkout.session';
	amount_subtotal: number;
	amount_total: number;
	cancel_url: string | null;
	success_url: string;
	client_reference_id: string | null;
	created: number;
	currency: string;
	customer_email: string | null;
	expires_at: number;
	livemode: false;
	metadata: Metadata;
	mode: 'payment';
	payment_intent: string | null;
	payment_status: 'unpaid' | 'paid';
	status: 'open' | 'complete' | 'expired';
	url: string | null;
}

export interface PaymentIntent {
	id: string;
	object: 'payment_intent';
	amount: number;
	amount_received: number;
	currency: string;
	created: number;
	latest_charge: string | null;
	last_payment_error: { code: string; decline_code?: string; message: string; type: string } | null;
	livemode: false;
	metadata: Metadata;
	status: 'requires_payment_method' | 'succeeded';
}

export interface Charge {
	id: string;
	object: 'charge';
	amount: number;
	amount_captured: number;
	amount_refunded: number;
	created: number;
	currency: string;
	livemode: false;
	metadata: Metadata;
	paid: boolean;
	payment_intent: string;
	refunded: boolean;
	status: 'succeeded';
}

export interface Refund {
	id: string;
	object: 'refund';
	amount: number;
	charge: string;
	created: number;
	currency: string;
	metadata: Metadata;
	payment_intent: string;
	reason: string | null;
	status: 'succeeded';
}

export interface StripeEvent {
	id: string;
	object: 'event';
	api_version: string;
	created: number;
	data: { object: unknown };
	livemode: false;
	pending_webhooks: number;
	request: { id: string | null; idempotency_key: string | null };
	type: string;
}

/** Everything the fake knows; lost when it stops. */
export class Store {
	sessions = new Map<string, CheckoutSession>();
	/** payment_intent_data.metadata of each session, copied onto its payment intent. */
	intentMetadata = new Map<string, Metadata>();
	intents = new Map<string, PaymentIntent>();
	charges = new Map<string, Charge>();
	refunds = new Map<string, Refund>();
	events = new Map<string, StripeEvent>();
	/** Idempotency-Key → the request it was first used with and the answer given. */
	idempotent = new Map<string, { request: string; status: number; body: unknown }>();
}
