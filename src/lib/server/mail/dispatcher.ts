/**
 * Sends what the outbox holds. Each message is claimed in its own short transaction with
 * FOR UPDATE SKIP LOCKED, so two app processes (or two dispatchers in one) never take the same
 * row; the row is marked sent, or its next attempt is moved back (backoff), before the lock goes.
 * A crash between the SMTP hand-over and the commit can send a message twice (at least once,
 * never lost); SMTP has no way to make that exactly once.
 */
import { QueryTypes } from 'sequelize';
import { DEFAULT_BACKOFF, retryDelayMs, type BackoffPolicy } from '../../mail/backoff';
import { User } from '../db/models';
import type { MailTransport } from './transport';

const sequelize = () => User.sequelize!;

interface Claimed {
	id: string;
	recipient: string;
	subject: string;
	html: string;
	text: string;
	attempts: number;
}

export interface DispatchOptions {
	policy?: BackoffPolicy;
	/** At most this many messages per call. */
	batch?: number;
}

/** Sends the due messages, one claim at a time. Returns what happened. */
export async function dispatchDue(
	transport: MailTransport,
	options: DispatchOptions = {}
): Promise<{ sent: number; retried: number; failed: number }> {
	const policy = options.policy ?? DEFAULT_BACKOFF;
	const outcome = { sent: 0, retried: 0, failed: 0 };
	for (let i = 0; i < (options.batch ?? 50); i++) {
		const done = await sequelize().transaction(async (transaction) => {
			const [row] = await sequelize().query<Claimed>(
				`SELECT id, recipient, subject, html, text, attempts FROM mail_outbox
				  WHERE status = 'queued' AND next_attempt_at <= now()
				  ORDER BY next_attempt_at, created_at LIMIT 1
				  FOR UPDATE SKIP LOCKED`,
				{ type: QueryTypes.SELECT, transaction }
			);
			if (!row) return false;
			try {
				await transport.send({
					to: row.recipient,
					subject: row.subject,
					html: row.html,
					text: row.text
				});
				await sequelize().query(
					`UPDATE mail_outbox SET status = 'sent', sent_at = now(), attempts = attempts + 1,
					        last_error = NULL WHERE id = :id`,
					{ transaction, replacements: { id: row.id } }
				);
				outcome.sent++;
			} catch (error) {
				const attempts = row.attempts + 1;
				const delay = retryDelayMs(attempts, policy);
				const reason = (error instanceof Error ? error.message : String(error)).slice(0, 1000);
				await sequelize().query(
					`UPDATE mail_outbox SET attempts = :attempts, last_error = :reason,
					        status = CASE WHEN :giveUp THEN 'failed' ELSE 'queued' END,
					        next_attempt_at = now() + make_interval(secs => :delaySeconds)
					  WHERE id = :id`,
					{
						transaction,
						replacements: {
							id: row.id,
							attempts,
							reason,
							giveUp: delay === null,
							delaySeconds: (delay ?? 0) / 1000
						}
					}
				);
				if (delay === null) outcome.failed++;
				else outcome.retried++;
				// The server is probably down: leave the other messages for the next round.
				return false;
			}
			return true;
		});
		if (!done) break;
	}
	return outcome;
}

/** Polls every `intervalMs` until stopped. Rounds never overlap. */
export function startPolling(
	transport: MailTransport,
	intervalMs: number,
	options: DispatchOptions & { log?: (line: string) => void } = {}
): { stop(): Promise<void> } {
	let stopped = false;
	let running: Promise<unknown> = Promise.resolve();
	let timer: ReturnType<typeof setTimeout> | undefined;
	// A database outage fails every round alike: say so once, and again when it is over.
	let lastFailure = '';
	const round = () => {
		running = dispatchDue(transport, options)
			.then((o) => {
				if (lastFailure) options.log?.('mail: dispatching again');
				lastFailure = '';
				if (o.retried || o.failed)
					options.log?.(`mail: ${o.sent} sent, ${o.retried} to retry, ${o.failed} failed`);
			})
			.catch((error) => {
				const failure = String(error);
				if (failure !== lastFailure) options.log?.(`mail: dispatch round failed: ${failure}`);
				lastFailure = failure;
			})
			.finally(() => {
				if (!stopped) timer = setTimeout(round, intervalMs);
			});
	};
	timer = setTimeout(round, 0);
	return {
		async stop() {
			stopped = true;
			clearTimeout(timer);
			await running;
		}
	};
}
