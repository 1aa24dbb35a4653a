/**
 * The app's one mail dispatcher, started from hooks.server.ts `init` (never during the build).
 * MAIL_POLL_MS (3000) is how often it looks for due mail; MAIL_RETRY_BASE_MS (30000) the first
 * backoff step; MAIL_DISPATCH=off leaves the outbox alone (another process sends).
 */
import { env } from '$env/dynamic/private';
import { DEFAULT_BACKOFF } from '../../mail/backoff';
import { startPolling } from './dispatcher';
import { createTransport, smtpConfigFrom } from './transport';

let running: { stop(): Promise<void> } | null = null;

export function startMailDispatcher(): void {
	if (running || env.MAIL_DISPATCH === 'off') return;
	const transport = createTransport(smtpConfigFrom(env));
	const base = Number(env.MAIL_RETRY_BASE_MS || DEFAULT_BACKOFF.baseMs);
	const poller = startPolling(transport, Number(env.MAIL_POLL_MS || 3000), {
		policy: { ...DEFAULT_BACKOFF, baseMs: base > 0 ? base : DEFAULT_BACKOFF.baseMs },
		log: (line) => console.error(line)
	});
	running = {
		async stop() {
			await poller.stop();
			transport.close();
		}
	};
}

export async function stopMailDispatcher(): Promise<void> {
	await running?.stop();
	running = null;
}
