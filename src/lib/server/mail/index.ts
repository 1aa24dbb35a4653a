/**
 * The app's one mail dispatcher, started from hooks.server.ts `init` (never during the build).
 * MAIL_POLL_MS (3000) is how often it looks for due mail; MAIL_RETRY_BASE_MS (30000) the first
 * backoff step; MAIL_DISPATCH=off leaves the outbox alone (another process sends).
 */
import { env } from '$env/dynamic/private';
import { DEFAULT_BACKOFF } from '../../mail/backoff';
import { sendExpiryReminders } from '../services/supporting-document-expiry';
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
	// Supporting documents about to lapse: looked for hourly (EXPIRY_CHECK_MS) and once soon after
	// start. Safe with several processes: each reminder is claimed with SKIP LOCKED and sent once.
	const every = Number(env.EXPIRY_CHECK_MS || 3_600_000);
	const remind = () =>
		void sendExpiryReminders(new Date()).catch((e) =>
			console.error(`[mail] expiry reminders failed: ${(e as Error).message}`)
		);
	const first = setTimeout(remind, 10_000);
	const hourly = setInterval(remind, every > 0 ? every : 3_600_000);
	first.unref();
	hourly.unref();
	running = {
		async stop() {
			clearTimeout(first);
			clearInterval(hourly);
			await poller.stop();
			transport.close();
		}
	};
}

export async function stopMailDispatcher(): Promise<void> {
	await running?.stop();
	running = null;
}
