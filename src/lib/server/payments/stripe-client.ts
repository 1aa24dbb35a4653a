/**
 * The Stripe SDK, configured only from environment variables, so pointing Landfall at Stripe's
 * test mode (or the local fake) needs no code change:
 *   STRIPE_SECRET_KEY      sk_test_… (required)
 *   STRIPE_WEBHOOK_SECRET  whsec_… of the webhook endpoint (required)
 *   STRIPE_API_HOST, STRIPE_API_PORT, STRIPE_API_PROTOCOL   where the API is; Stripe's own when unset
 */
import { env } from '$env/dynamic/private';
import Stripe from 'stripe';

export interface StripeConfig {
	secretKey: string;
	webhookSecret: string;
	host?: string;
	port?: number;
	protocol?: 'http' | 'https';
}

export class PaymentsNotConfigured extends Error {}

/** Reads the configuration from an environment-like object; names what is missing or wrong. */
export function stripeConfigFrom(source: Record<string, string | undefined>): StripeConfig {
	const secretKey = source.STRIPE_SECRET_KEY?.trim();
	const webhookSecret = source.STRIPE_WEBHOOK_SECRET?.trim();
	if (!secretKey || !webhookSecret)
		throw new PaymentsNotConfigured(
			'Card payments are not set up: STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET are needed (see .env.example).'
		);
	const protocol = source.STRIPE_API_PROTOCOL?.trim() || undefined;
	if (protocol !== undefined && protocol !== 'http' && protocol !== 'https')
		throw new PaymentsNotConfigured('STRIPE_API_PROTOCOL must be http or https.');
	const port = source.STRIPE_API_PORT?.trim() ? Number(source.STRIPE_API_PORT) : undefined;
	if (port !== undefined && !(Number.isInteger(port) && port > 0 && port < 65536))
		throw new PaymentsNotConfigured('STRIPE_API_PORT must be a port number.');
	return {
		secretKey,
		webhookSecret,
		host: source.STRIPE_API_HOST?.trim() || undefined,
		port,
		protocol
	};
}

export function createStripe(config: StripeConfig): Stripe {
	return new Stripe(config.secretKey, {
		host: config.host,
		port: config.port,
		protocol: config.protocol,
		// Every POST carries Landfall's own idempotency key, so one retry is safe.
		maxNetworkRetries: 1,
		timeout: 20_000,
		telemetry: false,
		appInfo: { name: 'Landfall' }
	});
}

export interface Payments {
	stripe: Stripe;
	config: StripeConfig;
}

let current: Payments | undefined;

/** The app's Stripe client, made on first use from the environment; throws PaymentsNotConfigured. */
export function payments(): Payments {
	if (!current) {
		const config = stripeConfigFrom(env);
		current = { stripe: createStripe(config), config };
	}
	return current;
}

/** Tests and scripts, which have no SvelteKit environment, hand in their configuration. */
export function usePayments(config: StripeConfig): Payments {
	current = { stripe: createStripe(config), config };
	return current;
}
