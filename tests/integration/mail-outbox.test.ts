// The mail outbox against the real database and the local SMTP catcher (scripts/mail-catcher),
// run in this process on 127.0.0.1:LANDFALL_TEST_SMTP_PORT (12570). Messages go out through the
// real nodemailer transport the app uses.
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dispatchDue } from '$lib/server/mail/dispatcher';
import { enqueue, type OutgoingMessage } from '$lib/server/mail/outbox';
import { createTransport, smtpConfigFrom, type MailTransport } from '$lib/server/mail/transport';
import { startMailCatcher, type MailCatcher } from '../../scripts/mail-catcher/app';
import { countRows, sequelize, uniqueSuffix } from './db';

const SMTP_PORT = Number(process.env.LANDFALL_TEST_SMTP_PORT ?? 12570);
const fast = { baseMs: 200, capMs: 1000, maxAttempts: 5 };
let catcher: MailCatcher | null = null;
let transport: MailTransport;

const startCatcher = async () => {
	catcher = await startMailCatcher({ smtpPort: SMTP_PORT });
};
const stopCatcher = async () => {
	await catcher?.close();
	catcher = null;
};
const caughtFor = (recipient: string) =>
	(catcher?.mailbox.list() ?? []).filter((m) => m.envelope.to.includes(recipient));

function message(tag: string): OutgoingMessage {
	const recipient = `mail.${tag}@landfall-itest.example`;
	return {
		kind: 'booking_confirmed',
		recipient,
		subject: `Outbox test ${tag}`,
		html: `<p>Outbox test ${tag}</p>`,
		text: `Outbox test ${tag}`,
		dedupeKey: `itest:${tag}`
	};
}

const queue = (m: OutgoingMessage) => sequelize.transaction((t) => enqueue(t, m));
const rowOf = async (dedupeKey: string) => {
	const [row] = await sequelize.query<{
		status: string;
		attempts: number;
		last_error: string | null;
		due_in_ms: number;
	}>(
		`SELECT status, attempts, last_error,
		        (extract(epoch FROM next_attempt_at - now()) * 1000)::int AS due_in_ms
		   FROM mail_outbox WHERE dedupe_key = :dedupeKey`,
		{ replacements: { dedupeKey }, type: QueryTypes.SELECT }
	);
	return row!;
};
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

beforeAll(async () => {
	transport = createTransport(smtpConfigFrom({ SMTP_PORT: String(SMTP_PORT) }));
	await startCatcher();
	// Whatever earlier test files queued goes out first, so only this file's rows are due below.
	for (let i = 0; i < 20 && (await dispatchDue(transport, { batch: 500 })).sent > 0; i++);
});

afterAll(async () => {
	transport.close();
	await stopCatcher();
	await sequelize.query(`DELETE FROM mail_outbox WHERE dedupe_key LIKE 'itest:%'`);
});

describe('mail outbox', () => {
	it('queues nothing when the enqueuing transaction rolls back', async () => {
		const m = message(`rollback-${uniqueSuffix()}`);
		await expect(
			sequelize.transaction(async (t) => {
				await enqueue(t, m);
				throw new Error('the change fails');
			})
		).rejects.toThrow('the change fails');
		expect(await countRows('mail_outbox', 'dedupe_key = :k', { k: m.dedupeKey })).toBe(0);
	});

	it('queues the same dedupe key once', async () => {
		const m = message(`dedupe-${uniqueSuffix()}`);
		expect(await queue(m)).toBe(true);
		expect(await queue({ ...m, subject: 'again' })).toBe(false);
		expect(await countRows('mail_outbox', 'dedupe_key = :k', { k: m.dedupeKey })).toBe(1);
	});

	it('delivers a queued message to the catcher, HTML and text, and marks it sent', async () => {
		const m = message(`deliver-${uniqueSuffix()}`);
		await queue(m);
		const outcome = await dispatchDue(transport, { policy: fast });
		expect(outcome.sent).toBeGreaterThanOrEqual(1);
		const [caught] = caughtFor(m.recipient);
		expect(caught?.subject).toBe(m.subject);
		expect(caught?.text.trim()).toBe(m.text);
		expect(caught?.html).toContain('<p>Outbox test');
		expect((await rowOf(m.dedupeKey)).status).toBe('sent');
	});

	it('keeps messages while SMTP is down (attempts, backoff) and sends them once it is back', async () => {
		await stopCatcher();
		const m = message(`outage-${uniqueSuffix()}`);
		await queue(m);

		const first = await dispatchDue(transport, { policy: fast });
		expect(first).toEqual({ sent: 0, retried: 1, failed: 0 });
		let row = await rowOf(m.dedupeKey);
		expect(row.status).toBe('queued');
		expect(row.attempts).toBe(1);
		expect(row.last_error).toMatch(/ECONNREFUSED|connect/i);
		expect(row.due_in_ms).toBeGreaterThan(100); // 200 ms after the first failure

		// Not due yet: nothing is tried.
		expect(await dispatchDue(transport, { policy: fast })).toEqual({
			sent: 0,
			retried: 0,
			failed: 0
		});
		await sleep(250);
		await dispatchDue(transport, { policy: fast });
		row = await rowOf(m.dedupeKey);
		expect(row.attempts).toBe(2);
		expect(row.due_in_ms).toBeGreaterThan(300); // 400 ms after the second

		await startCatcher();
		await sleep(450);
		expect((await dispatchDue(transport, { policy: fast })).sent).toBe(1);
		expect(await dispatchDue(transport, { policy: fast })).toEqual({
			sent: 0,
			retried: 0,
			failed: 0
		});
		expect(caughtFor(m.recipient)).toHaveLength(1);
		row = await rowOf(m.dedupeKey);
		expect(row.status).toBe('sent');
		expect(row.attempts).toBe(3);
	});

	it('marks a message failed after the last attempt', async () => {
		await stopCatcher();
		const m = message(`giveup-${uniqueSuffix()}`);
		await queue(m);
		const policy = { baseMs: 10, capMs: 10, maxAttempts: 2 };
		await dispatchDue(transport, { policy });
		await sleep(30);
		expect((await dispatchDue(transport, { policy })).failed).toBe(1);
		expect((await rowOf(m.dedupeKey)).status).toBe('failed');
		await startCatcher();
	});

	it('two dispatchers at once send every message exactly once', async () => {
		const tag = uniqueSuffix();
		const messages = Array.from({ length: 12 }, (_, i) => message(`race-${tag}-${i}`));
		for (const m of messages) await queue(m);
		const other = createTransport(smtpConfigFrom({ SMTP_PORT: String(SMTP_PORT) }));
		const [a, b] = await Promise.all([
			dispatchDue(transport, { policy: fast }),
			dispatchDue(other, { policy: fast })
		]);
		other.close();
		expect(a.sent + b.sent).toBe(12);
		for (const m of messages) expect(caughtFor(m.recipient)).toHaveLength(1);
	});
});
