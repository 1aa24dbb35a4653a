// The driver of scripts/bench/faults.sh (read it first): load, faults, and the checks afterwards.
// Env: BENCH_BASE (the app, on 127.0.0.1), BENCH_APP_PID, DATABASE_URL, LANDFALL_PG_* (for
// scripts/pg.sh), MAIL_CATCHER_* (the catcher this script starts, stops and starts again).
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { setTimeout as sleep } from 'node:timers/promises';
import pg from 'pg';
import { benchBase, signIn } from './http';

const BASE = benchBase('http://127.0.0.1:4399');
const APP_PID = Number(process.env.BENCH_APP_PID);
const WORKERS = 8;
const LOAD_SECONDS = Number(process.env.BENCH_FAULT_SECONDS ?? 24);
const OUTAGE_AT_MS = 7_000;
const OUTAGE_MS = 4_000;
const MAIL_WEB = `http://127.0.0.1:${process.env.MAIL_CATCHER_WEB_PORT}`;
const RUN_TAG = `Fault run ${Date.now()}`;
const db = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 2 });
db.on('error', () => {}); // idle connections die with the restart; the pool makes new ones

const checks: { name: string; ok: boolean; detail: string }[] = [];
function check(name: string, ok: boolean, detail: string) {
	checks.push({ name, ok, detail });
	console.log(`  ${ok ? 'PASS' : 'FAIL'}  ${name}: ${detail}`);
}

const pgSh = (command: string) => {
	const t0 = Date.now();
	const r = spawnSync('bash', ['scripts/pg.sh', command], { stdio: ['ignore', 'ignore', 'pipe'] });
	if (r.status !== 0) throw new Error(`pg.sh ${command} failed: ${r.stderr}`);
	return Date.now() - t0;
};

async function query<T extends pg.QueryResultRow>(sql: string, values: unknown[] = []) {
	return (await db.query<T>(sql, values)).rows;
}

interface Answer {
	at: number;
	what: string;
	status: number;
	code?: string;
}

async function call(cookie: string, what: string, path: string, init: RequestInit = {}) {
	const started = Date.now();
	try {
		const response = await fetch(`${BASE}${path}`, {
			...init,
			headers: { cookie, origin: BASE, 'content-type': 'application/json', ...init.headers },
			redirect: 'manual',
			signal: AbortSignal.timeout(15_000)
		});
		const text = await response.text();
		let body: Record<string, unknown> = {};
		try {
			body = JSON.parse(text) as Record<string, unknown>;
		} catch {
			// pages answer HTML
		}
		return {
			answer: { at: started, what, status: response.status, code: body.code as string },
			body
		};
	} catch (e) {
		// 0: no HTTP answer at all (the connection failed): never acceptable.
		return { answer: { at: started, what, status: 0, code: String(e) }, body: {} };
	}
}

// --- 1. PostgreSQL stopped and started again under load -----------------------------------------
async function databaseRestart(cookie: string) {
	console.log(`\n== 1. PostgreSQL restarted under load (${WORKERS} clients, ${LOAD_SECONDS} s)`);
	const [ids] = await query<Record<string, string>>(
		`SELECT (SELECT id FROM organizations WHERE name = 'Hallvik Heimtechnik GmbH') AS "customerId",
		        (SELECT id FROM places WHERE code = 'MYPKG') AS "originId",
		        (SELECT id FROM places WHERE code = 'DEHAM') AS "destinationId",
		        (SELECT id FROM products WHERE sku = 'SLV-PBL-20') AS p1,
		        (SELECT id FROM products WHERE sku = 'SLV-TWR-80') AS p2`
	);
	const { p1, p2, ...place } = ids!;
	const header = {
		...place,
		incoterm: 'FCA',
		incotermPlace: 'Port Klang',
		modesConsidered: ['sea_fcl'],
		chosenMode: 'sea_fcl',
		currency: 'EUR',
		notes: RUN_TAG
	};
	const answers: Answer[] = [];
	const created: string[] = [];
	const end = Date.now() + LOAD_SECONDS * 1000;
	const worker = async (n: number) => {
		for (let i = 0; Date.now() < end; i++) {
			if ((i + n) % 2 === 0) {
				answers.push((await call(cookie, 'list', '/api/v1/shipments?pageSize=20')).answer);
				continue;
			}
			const made = await call(cookie, 'create', '/api/v1/shipments', {
				method: 'POST',
				body: JSON.stringify(header)
			});
			answers.push(made.answer);
			if (made.answer.status !== 201) continue;
			const id = made.body.id as string;
			created.push(id);
			const lines = await call(cookie, 'lines', `/api/v1/shipments/${id}/lines`, {
				method: 'PUT',
				body: JSON.stringify({
					version: (made.body.version as number | undefined) ?? 0,
					lines: [
						{ productId: p1, quantity: 24, unitPrice: '' },
						{ productId: p2, quantity: 4, unitPrice: '' }
					]
				})
			});
			answers.push(lines.answer);
		}
	};
	const outage = (async () => {
		await sleep(OUTAGE_AT_MS);
		const stopMs = pgSh('stop');
		console.log(`  PostgreSQL stopped (${stopMs} ms) at +${OUTAGE_AT_MS / 1000} s`);
		await sleep(OUTAGE_MS);
		const startMs = pgSh('start');
		console.log(`  PostgreSQL started again (${startMs} ms)`);
		return Date.now();
	})();
	await Promise.all([...Array.from({ length: WORKERS }, (_, n) => worker(n)), outage]);
	const backAt = await outage;

	const by = new Map<string, number>();
	for (const a of answers)
		by.set(`${a.what} ${a.status}`, (by.get(`${a.what} ${a.status}`) ?? 0) + 1);
	console.log(`  answers: ${[...by].map(([k, n]) => `${k}×${n}`).join(', ')}`);
	const bad = answers.filter((a) => ![200, 201, 503].includes(a.status));
	check(
		'no 500 and no dropped connection',
		bad.length === 0,
		bad.length === 0
			? `${answers.length} answers, all 200/201/503`
			: JSON.stringify(bad.slice(0, 5))
	);
	const unavailable = answers.filter((a) => a.status === 503);
	check(
		'requests in the gap got a clean 503',
		unavailable.length > 0 && unavailable.every((a) => a.code === 'database_unavailable'),
		`${unavailable.length} × 503 with code database_unavailable`
	);
	const firstOk = answers
		.filter((a) => a.at >= backAt && a.status < 300)
		.reduce((m, a) => Math.min(m, a.at), Infinity);
	check(
		'the same app process recovers by itself',
		Number.isFinite(firstOk) && isAlive(APP_PID),
		`first success ${Number.isFinite(firstOk) ? `${firstOk - backAt} ms` : 'never'} after PostgreSQL was back; pid ${APP_PID} ${isAlive(APP_PID) ? 'still running' : 'gone'}`
	);

	// No partial write: a shipment exists with its audit event and all or none of its lines, and
	// the reference counter equals the shipments that exist (a rolled-back create leaves no gap).
	const mine = await query<{ id: string; lines: string; audits: string }>(
		`SELECT s.id, (SELECT count(*) FROM shipment_lines l WHERE l.shipment_id = s.id) AS lines,
		        (SELECT count(*) FROM audit_events a WHERE a.entity_id = s.id::text AND a.action = 'shipment.create') AS audits
		   FROM shipments s WHERE s.notes = $1`,
		[RUN_TAG]
	);
	const partial = mine.filter((s) => !['0', '2'].includes(s.lines) || s.audits !== '1');
	const missing = created.filter((id) => !mine.some((s) => s.id === id));
	check(
		'no partial write',
		partial.length === 0 && missing.length === 0,
		`${mine.length} shipments made in the run (${created.length} answered 201), ${partial.length} with part of their lines or audit, ${missing.length} answered 201 but missing`
	);
	const gaps = await query<{ exporter_id: string; last_value: number; n: string }>(
		`SELECT c.exporter_id, c.last_value,
		        (SELECT count(*) FROM shipments s WHERE s.exporter_id = c.exporter_id
		            AND s.reference LIKE 'SHP-' || c.year || '-%') AS n
		   FROM shipment_reference_counters c`
	);
	check(
		'shipment references stay gap-free',
		gaps.every((g) => Number(g.n) === g.last_value),
		gaps.map((g) => `counter ${g.last_value}, shipments ${g.n}`).join('; ')
	);
	return mine.filter((s) => s.lines === '2').map((s) => s.id);
}

function isAlive(pid: number) {
	try {
		process.kill(pid, 0);
		return true;
	} catch {
		return false;
	}
}

// --- 2. The SMTP catcher stopped while e-mail is queued -----------------------------------------
function startCatcher(): ChildProcess {
	return spawn('node', ['--import', 'tsx', 'scripts/mail-catcher/main.ts'], {
		stdio: 'ignore',
		env: process.env
	});
}

async function catcherUp() {
	for (let i = 0; i < 100; i++) {
		try {
			if ((await fetch(`${MAIL_WEB}/health`)).ok) return;
		} catch {
			// not yet
		}
		await sleep(100);
	}
	throw new Error('the mail catcher did not start');
}

async function book(cookie: string, id: string) {
	const [{ version }] = (await query<{ version: number }>(
		'SELECT version FROM shipments WHERE id = $1',
		[id]
	)) as [{ version: number }];
	const response = await fetch(`${BASE}/shipments/${id}?/status`, {
		method: 'POST',
		headers: { cookie, origin: BASE, 'x-sveltekit-action': 'true', accept: 'application/json' },
		body: new URLSearchParams({ to: 'booked', note: '', version: String(version) })
	});
	const body = (await response.json()) as { type: string };
	if (body.type !== 'success') throw new Error(`booking ${id}: ${JSON.stringify(body)}`);
}

async function mailOutage(cookie: string, shipments: string[]) {
	const batch = shipments.slice(0, 20);
	console.log(`\n== 2. The SMTP catcher stopped while ${batch.length} bookings queue their e-mail`);
	let catcher = startCatcher();
	await catcherUp();
	const half = Math.ceil(batch.length / 2);
	await Promise.all(batch.slice(0, half).map((id) => book(cookie, id)));
	catcher.kill('SIGTERM');
	console.log('  catcher stopped');
	await Promise.all(batch.slice(half).map((id) => book(cookie, id)));
	await sleep(3_000);
	const [{ waiting }] = (await query<{ waiting: string }>(
		"SELECT count(*) AS waiting FROM mail_outbox WHERE status = 'queued' AND attempts > 0"
	)) as [{ waiting: string }];
	check(
		'mail waits for its retry while SMTP is down',
		Number(waiting) > 0,
		`${waiting} e-mails queued after a failed attempt`
	);
	catcher = startCatcher();
	await catcherUp();
	console.log('  catcher started again');
	const deadline = Date.now() + 60_000;
	while (Date.now() < deadline) {
		const [{ queued }] = (await query<{ queued: string }>(
			"SELECT count(*) AS queued FROM mail_outbox WHERE status = 'queued'"
		)) as [{ queued: string }];
		if (queued === '0') break;
		await sleep(500);
	}
	const references = (
		await query<{ reference: string }>(
			'SELECT reference FROM shipments WHERE id = ANY($1::uuid[])',
			[batch]
		)
	).map((r) => r.reference);
	const outbox = await query<{ recipient: string; subject: string; status: string }>(
		`SELECT recipient, subject, status FROM mail_outbox WHERE kind = 'booking_confirmed'`
	);
	const ours = outbox.filter((m) => references.some((r) => m.subject.includes(r)));
	const caught = (
		(await (await fetch(`${MAIL_WEB}/messages`)).json()) as {
			envelope: { to: string[] };
			subject: string;
		}[]
	).filter((m) => references.some((r) => m.subject.includes(r)));
	const key = (to: string, subject: string) => `${to}|${subject}`;
	const sent = new Map<string, number>();
	for (const m of caught)
		for (const to of m.envelope.to)
			sent.set(key(to, m.subject), (sent.get(key(to, m.subject)) ?? 0) + 1);
	const lost = ours.filter((m) => !sent.has(key(m.recipient, m.subject)));
	const twice = [...sent.values()].filter((n) => n > 1).length;
	check(
		'every e-mail arrives, exactly once',
		ours.length >= batch.length &&
			ours.every((m) => m.status === 'sent') &&
			lost.length === 0 &&
			twice === 0,
		`${ours.length} booking e-mails queued for ${batch.length} bookings, ${ours.filter((m) => m.status === 'sent').length} sent, ${lost.length} lost, ${twice} delivered twice`
	);
	catcher.kill('SIGTERM');
}

async function main() {
	console.log(
		`load average before: ${(await import('node:os'))
			.loadavg()
			.map((l) => l.toFixed(2))
			.join(' ')}`
	);
	const cookie = await signIn(BASE, 'coordinator@solvrae.example', 'Landfall-demo-2026');
	const shipments = await databaseRestart(cookie);
	await mailOutage(cookie, shipments);
	await db.end();
	const failed = checks.filter((c) => !c.ok);
	console.log(`\n${checks.length - failed.length}/${checks.length} checks passed`);
	process.exit(failed.length === 0 ? 0 : 1);
}

await main();
