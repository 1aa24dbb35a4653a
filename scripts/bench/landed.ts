// Part A of npm run bench:landed (scripts/bench/landed.sh runs it, then Part B over HTTP) — the
// landed-cost engine on a 500-line shipment (invented data), for four modes (air, sea FCL, sea
// LCL, road), run N times after warm-up runs. Prints p50/p95/max per mode against the 50 ms
// target, PASS/OVER and the ratio. A benchmark, not a test: it prints figures and never fails CI.
//
// Options (argument or environment variable):
//   --runs=N     BENCH_LANDED_RUNS   default 50
//   --lines=N    BENCH_LANDED_LINES  default 500
import os from 'node:os';
import { performance } from 'node:perf_hooks';
import { landedCost } from '../../src/lib/landed-cost';
import type { RateCard, TransportMode } from '../../src/lib/landed-cost';
import { LANDED_CARDS, landedBenchInput } from './landed-input';
import { ms, recordResult, summarize } from './stats';

const TARGET_MS = 50;
/** Runs after the first (cold) one before timing, so the JIT has settled. */
const WARM_UP = 10;

function option(name: string, env: string, fallback: number): number {
	const arg = process.argv.find((a) => a.startsWith(`--${name}=`));
	const n = Number(arg?.slice(name.length + 3) ?? process.env[env] ?? fallback);
	return Number.isInteger(n) && n > 0 ? n : fallback;
}

const runs = option('runs', 'BENCH_LANDED_RUNS', 50);
const lineCount = option('lines', 'BENCH_LANDED_LINES', 500);

const cpu = os.cpus()[0]?.model ?? 'unknown CPU';
console.log(`Landed-cost benchmark, ${new Date().toISOString().slice(0, 10)}`);
console.log(
	`Machine: ${cpu}, ${os.cpus().length} cores, Node ${process.version}, ${os.platform()}`
);
console.log(
	`Part A, in process: ${lineCount} lines, ${runs} runs per mode after ${WARM_UP + 1} warm-up runs`
);
console.log('');
console.log(
	'| Mode | First run | p50 | p95 | max | Target (p95) | Ratio | Verdict | Trail steps |'
);
console.log('| --- | --- | --- | --- | --- | --- | --- | --- | --- |');
for (const [mode, card] of Object.entries(LANDED_CARDS) as [TransportMode, RateCard][]) {
	const data = landedBenchInput(mode, card, lineCount);
	const t0 = performance.now();
	const first = landedCost(data);
	const coldMs = performance.now() - t0;
	if (!first.ok) throw new Error(`${mode}: ${JSON.stringify(first.missing)}`);
	for (let i = 0; i < WARM_UP; i++) landedCost(data);
	const samples: number[] = [];
	for (let i = 0; i < runs; i++) {
		const start = performance.now();
		landedCost(data);
		samples.push(performance.now() - start);
	}
	const s = summarize(samples);
	const { ratio, verdict } = recordResult(
		`landed cost ${mode}, ${lineCount} lines`,
		TARGET_MS,
		s,
		`${runs} runs after ${WARM_UP + 1} warm-up runs, one process`
	);
	console.log(
		`| ${mode} | ${ms(coldMs)} | ${ms(s.p50)} | ${ms(s.p95)} | ${ms(s.max)} | ${TARGET_MS} ms | ${ratio.toFixed(2)} | ${verdict} | ${first.trail.length} |`
	);
}
process.exit(0);
