// The last step of `npm run bench` (all.sh): one results file from the parts' outputs in
// $BENCH_WORK — http-suite.json, results.tsv (recordResult rows of the other benchmarks), and the
// tables load.ts and landed-http.ts print — with the machine's facts and the load before the run.
// Usage: BENCH_WORK=dir BENCH_LOAD_BEFORE="l1 l5 l15" tsx scripts/bench/report.ts [outdir=docs]
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import { join } from 'node:path';
import * as prettier from 'prettier';
import { ms } from './stats';
import { TARGETS, type SuiteResults, type SuiteRun } from './suite-results';
import { WHY_OVER } from './why-over';

const work = process.env.BENCH_WORK ?? '';
const outDir = process.argv[2] ?? 'docs';
if (!existsSync(join(work, 'http-suite.json'))) {
	console.error(`No http-suite.json in BENCH_WORK (${work || 'unset'}); run npm run bench.`);
	process.exit(2);
}
const suite = JSON.parse(readFileSync(join(work, 'http-suite.json'), 'utf8')) as SuiteResults;
const text = (name: string) =>
	existsSync(join(work, name)) ? readFileSync(join(work, name), 'utf8') : '';
/** The markdown table lines a part printed. */
const tableOf = (name: string) =>
	text(name)
		.split('\n')
		.filter((l) => l.startsWith('|'));

// --- machine facts ---------------------------------------------------------------------------
const loadBefore = (process.env.BENCH_LOAD_BEFORE ?? '').split(' ').map(Number);
const cores = os.availableParallelism();
const busy = Number.isFinite(loadBefore[0]) && loadBefore[0]! > cores * 0.75;
const git = (...args: string[]) => {
	try {
		return execFileSync('git', args, { encoding: 'utf8' }).trim();
	} catch {
		return '';
	}
};
const facts = {
	date: new Date().toISOString(),
	commit:
		git('rev-parse', '--short', 'HEAD') +
		(git('status', '--porcelain', '--', 'src') ? ' (src changed)' : ''),
	nproc: cores,
	cpu: os.cpus()[0]?.model ?? 'unknown',
	memoryGiB: os.totalmem() / 2 ** 30,
	node: process.version,
	os: `${os.type()} ${os.release()}`,
	loadBefore: process.env.BENCH_LOAD_BEFORE ?? 'unknown',
	loadAfter: os
		.loadavg()
		.map((l) => l.toFixed(2))
		.join(' '),
	busyBefore: busy,
	elapsedS: Number(process.env.BENCH_ELAPSED_S) || null
};

// --- tables ----------------------------------------------------------------------------------
const row = (cells: (string | number)[]) => `| ${cells.join(' | ')} |`;
const fixed = (x: number, digits = 1) => (Number.isFinite(x) ? x.toFixed(digits) : 'n/a');
const failures = (r: SuiteRun) =>
	r.errors + r.non2xx === 0
		? '0'
		: `${r.errors} errors, ${r.non2xx} non-2xx (${Object.entries(r.statuses)
				.filter(([code]) => !code.startsWith('2'))
				.map(([code, n]) => `${code}×${n}`)
				.join(' ')})`;

const httpHeader = [
	'Route',
	'Kind',
	'Requests/s',
	'p50',
	'p95',
	'max',
	'Errors / non-2xx',
	'p95 ÷ no-op',
	'req/s ÷ no-op',
	'RSS peak MiB',
	`p95 < ${TARGETS.readP95Ms} ms`,
	`max < ${TARGETS.maxMs / 1000} s`,
	'0 errors'
];
const httpRows = suite.runs.map((r) =>
	row([
		r.label,
		r.kind,
		fixed(r.requestsPerSecond),
		ms(r.p50),
		ms(r.p95),
		ms(r.max),
		failures(r),
		fixed(r.p95Ratio),
		fixed(r.rpsRatio, 3),
		fixed(r.rssPeakMiB, 0),
		r.verdicts.p95,
		r.verdicts.max,
		r.verdicts.errors
	])
);
const misses = suite.runs.filter((r) => Object.values(r.verdicts).includes('OVER'));
const readsOk = suite.runs.filter((r) => r.kind === 'read').every((r) => r.verdicts.p95 === 'PASS');

const tsv = text('results.tsv')
	.split('\n')
	.filter(Boolean)
	.map((l) => l.split('\t'));

const md = [
	'# Benchmark results',
	'',
	'Written by `npm run bench` (`scripts/bench/all.sh`); do not edit by hand, run it again.',
	'',
	...(busy
		? [
				`> **Warning:** the load average before the run was ${facts.loadBefore} on ${cores} CPUs: other`,
				'> work on the machine was using it, so these figures are inflated by it.',
				''
			]
		: []),
	'## Machine',
	'',
	row(['Fact', 'Value']),
	row(['---', '---']),
	row(['Date', facts.date]),
	row(['Commit', facts.commit]),
	row(['CPUs (nproc)', facts.nproc]),
	row(['CPU', facts.cpu]),
	row(['Memory', `${facts.memoryGiB.toFixed(1)} GiB`]),
	row(['Node', facts.node]),
	row(['OS', facts.os]),
	row(['Load average before (1, 5, 15 min)', facts.loadBefore]),
	row(['Load average after', facts.loadAfter]),
	row(['Whole run', facts.elapsedS ? `${facts.elapsedS} s` : 'n/a']),
	'',
	'## HTTP on loopback',
	'',
	`Each route for ${suite.durationS} s at ${suite.connections} concurrent connections (autocannon),`,
	'against `node build` and PostgreSQL on the same machine, with the demo data and 10,000 bench',
	'shipments; autocannon runs on the same cores. Latencies are exact per response (nearest rank).',
	'Ratios are to the no-op route `GET /api/ping` of the same server, measured first in the same run',
	'(and again last: the floor should not have moved). Targets (issue 9, on 2 cores): reads p95',
	`under ${TARGETS.readP95Ms} ms, no request over ${TARGETS.maxMs / 1000} s, no errors. Sign-in is a write and has no p95 target.`,
	'',
	row(httpHeader),
	row(httpHeader.map(() => '---')),
	...httpRows,
	'',
	`Server process memory (one process; the load planner's worker threads are in it): peak`,
	`resident set (VmHWM) **${fixed(suite.memory.hwmMiB, 0)} MiB**; RSS ${fixed(suite.memory.rssStartMiB, 0)} MiB before the`,
	`timed runs and ${fixed(suite.memory.rssEndMiB, 0)} MiB at the end. When profiled, the resident set grew`,
	'as V8 sized its heap to the request rate (about 100 → 220 MiB in a first 10 s no-op run alone;',
	'a second added 10 MiB), sign-in added about 80 MiB at its peak (argon2id takes 19 MiB per hash,',
	'four at a time), and the load planner’s worker thread has a heap of its own.',
	'',
	...suite.runs.filter((r) => r.note).map((r) => `- ${r.label}: ${r.note}.`),
	'',
	'### Verdict',
	'',
	misses.length === 0
		? 'Every route meets its targets.'
		: `${readsOk ? 'Every read meets the p95 target.' : 'Not every read meets the p95 target.'} Targets missed:`,
	'',
	...misses.map(
		(r) =>
			`- **${r.label}** (${Object.entries(r.verdicts)
				.filter(([, v]) => v === 'OVER')
				.map(([k]) => k)
				.join(', ')}): ${WHY_OVER[r.key] ?? 'not yet explained.'}`
	),
	'',
	'## The other benchmarks (in process unless said)',
	'',
	row(['Benchmark', 'Target (p95)', 'p50', 'p95', 'p95 ÷ target', 'Verdict', 'Basis']),
	row(['---', '---', '---', '---', '---', '---', '---']),
	...tsv.map((cells) => row(cells)),
	'',
	'The shipments list and "Measure API" rows are bench:measure Part B on the same server, 5 s a',
	'route: the API rows send one request at a time and include HTTP, validation and the JSON of',
	'the result (about 0.3 MB loose, 0.9 MB on pallets) against the in-process target of 20 ms.',
	'',
	'### bench:load, a quick subset (first instances of a few sets)',
	'',
	...tableOf('load.out'),
	'',
	'The full run (all 15 sets, 100 instances each) is in `docs/load-plan-benchmark.md`.',
	'',
	`### bench:landed Part B, on the same server (${suite.connections} connections, 5 s per route)`,
	'',
	...tableOf('landed-http.out'),
	'',
	'### bench:faults, services failing under load (its own cluster and app)',
	'',
	'PostgreSQL stopped for 4 s in the middle of 8 clients creating and listing shipments, then the',
	'SMTP catcher stopped while bookings queue their e-mail (`scripts/bench/faults.sh`).',
	'',
	...faultLines(),
	''
];

/** What bench:faults printed: its answer counts and each check's verdict, as list items. */
function faultLines(): string[] {
	const lines = text('faults.out')
		.split('\n')
		.map((l) => l.trim())
		.filter((l) => /^(PASS|FAIL)\s|^answers:|^\d+\/\d+ checks passed/.test(l));
	return lines.length ? lines.map((l) => `- ${l}`) : ['- (bench:faults did not run)'];
}

// Written as the project's Prettier would, so `npm run lint` accepts the committed files.
async function write(file: string, text: string, parser: 'markdown' | 'json') {
	const options = (await prettier.resolveConfig(file)) ?? {};
	writeFileSync(file, await prettier.format(text, { ...options, parser }));
}
mkdirSync(outDir, { recursive: true });
await write(join(outDir, 'bench-results.md'), md.join('\n'), 'markdown');
await write(
	join(outDir, 'bench-results.json'),
	JSON.stringify({ machine: facts, http: suite, benchmarks: tsv }),
	'json'
);
console.log(`Wrote ${join(outDir, 'bench-results.md')} and bench-results.json`);
if (busy) console.error('WARNING: the machine was busy before the run; figures are inflated.');
