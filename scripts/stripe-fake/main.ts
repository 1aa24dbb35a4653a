// Runs the local Stripe fake: `tsx scripts/stripe-fake/main.ts`. Loopback only. Reads
// STRIPE_FAKE_PORT (4312), STRIPE_SECRET_KEY, STRIPE_WEBHOOK_SECRET, STRIPE_FAKE_WEBHOOK_URL
// (where events go, e.g. http://127.0.0.1:4310/api/v1/stripe/webhook) and STRIPE_FAKE_RETRY_MS.
import { startStripeFake } from './app';

const env = process.env;
const need = (name: string) => {
	const value = env[name];
	if (!value) {
		console.error(`[stripe-fake] ${name} is not set`);
		process.exit(1);
	}
	return value;
};

const fake = await startStripeFake({
	host: '127.0.0.1',
	port: Number(env.STRIPE_FAKE_PORT ?? 4312),
	apiKey: need('STRIPE_SECRET_KEY'),
	webhookSecret: need('STRIPE_WEBHOOK_SECRET'),
	webhookUrl: env.STRIPE_FAKE_WEBHOOK_URL || null,
	retryBaseMs: Number(env.STRIPE_FAKE_RETRY_MS ?? 1000),
	log: (line) => console.error(`[stripe-fake] ${line}`)
});
console.error(
	`[stripe-fake] listening on ${fake.url}; webhooks to ${env.STRIPE_FAKE_WEBHOOK_URL || '(none)'}`
);
const stop = () => void fake.close().then(() => process.exit(0));
process.once('SIGINT', stop);
process.once('SIGTERM', stop);
