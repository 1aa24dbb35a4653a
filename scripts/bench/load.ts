// npm run bench:load — the load planner on the Bischoff & Ratcliff (BR1–BR7) and Davies &
// Bischoff (BR8–BR15) instances, full support, orientation flags of the data. Prints per set the
// mean volume utilisation, mean/max wall time and mean CPU time per instance, the ratio to the best published
// full-support figure, and the constraint violations validatePlan finds (must be 0).
// A benchmark, not a test: it prints figures and never fails CI.
//
// Options (argument or environment variable):
//   --data=DIR        BENCH_LOAD_DATA       default ../shared/benchmarks/container-loading
//   --sets=1-7,9      BENCH_LOAD_SETS       default 1-15
//   --instances=N     BENCH_LOAD_INSTANCES  first N instances of each set, default 100
//   --budget=MS       BENCH_LOAD_BUDGET_MS  time budget per instance, default 2500 (turned into a
//                                           work budget: the same plans on any machine)
import { existsSync } from 'node:fs';
import os from 'node:os';
import { resolve } from 'node:path';
import { performance } from 'node:perf_hooks';
import { WORK_PER_MS, planLoad, validatePlan } from '../../src/lib/load-plan';
import { brInput, readBrSet } from './load-br';
import { PUBLISHED } from './load-published';

function option(name: string, env: string, fallback: string): string {
	const arg = process.argv.find((a) => a.startsWith(`--${name}=`));
	return arg?.slice(name.length + 3) ?? process.env[env] ?? fallback;
}

function parseSets(text: string): number[] {
	const out: number[] = [];
	for (const part of text.split(',')) {
		const [a, b] = part.split('-').map(Number);
		for (let s = a!; s <= (b ?? a!); s++) if (s >= 0 && s <= 15) out.push(s);
	}
	return out;
}

const data = resolve(option('data', 'BENCH_LOAD_DATA', '../shared/benchmarks/container-loading'));
const sets = parseSets(option('sets', 'BENCH_LOAD_SETS', '1-15'));
const perSet = Math.max(1, Number(option('instances', 'BENCH_LOAD_INSTANCES', '100')) || 100);
const budget = Math.max(10, Number(option('budget', 'BENCH_LOAD_BUDGET_MS', '2500')) || 2500);

if (!existsSync(`${data}/br1.txt`)) {
	console.error(`No benchmark data in ${data}; set BENCH_LOAD_DATA or --data=DIR.`);
	process.exit(0);
}

const cpu = os.cpus()[0]?.model ?? 'unknown CPU';
console.log(`Load planner benchmark, ${new Date().toISOString().slice(0, 10)}`);
console.log(
	`Machine: ${cpu}, ${os.cpus().length} cores, Node ${process.version}, ${os.platform()}`
);
console.log(`Data: ${data}`);
console.log(
	`Full support (100 %), orientation flags of the data; budget ${budget} ms = ${budget * WORK_PER_MS} work units per instance, one core; first ${perSet} instances per set`
);
console.log('');

interface Row {
	set: number;
	n: number;
	util: number;
	meanMs: number;
	maxMs: number;
	cpuMs: number;
	violations: number;
}

function runSet(set: number): Row {
	const instances = readBrSet(data, set).slice(0, perSet);
	let util = 0;
	let total = 0;
	let max = 0;
	let cpu = 0;
	let violations = 0;
	for (const inst of instances) {
		const input = brInput(inst, budget);
		const t0 = performance.now();
		const c0 = process.cpuUsage().user;
		const result = planLoad(input);
		const ms = performance.now() - t0;
		cpu += (process.cpuUsage().user - c0) / 1000;
		if (!result.ok) throw new Error(`BR${set} #${inst.number}: ${JSON.stringify(result.problems)}`);
		const found = validatePlan(input, result.plan);
		violations += found.length;
		for (const v of found.slice(0, 3)) console.error(`BR${set} #${inst.number}: ${v.message}`);
		const c = result.plan.containers[0];
		const [L, W, H] = inst.container;
		const vol = (c?.placements ?? []).reduce((s, p) => s + p.lengthMm * p.widthMm * p.heightMm, 0);
		util += (100 * vol) / (L * W * H);
		total += ms;
		max = Math.max(max, ms);
	}
	return {
		set,
		n: instances.length,
		util: util / instances.length,
		meanMs: total / instances.length,
		maxMs: max,
		cpuMs: cpu / instances.length,
		violations
	};
}

function line(cells: (string | number)[]): string {
	return `| ${cells.join(' | ')} |`;
}

const header = [
	'Set',
	'Instances',
	'Mean utilisation %',
	'Mean s',
	'Max s',
	'CPU s',
	'Best full-support %',
	'Ratio',
	'CLTRS packing %',
	'Violations'
];
console.log(line(header));
console.log(line(header.map(() => '---')));
const rows: Row[] = [];
const printRow = (label: string, r: Omit<Row, 'set'>, best: number, cltrs: number) =>
	console.log(
		line([
			label,
			r.n,
			r.util.toFixed(2),
			(r.meanMs / 1000).toFixed(2),
			(r.maxMs / 1000).toFixed(2),
			(r.cpuMs / 1000).toFixed(2),
			best.toFixed(2),
			(r.util / best).toFixed(3),
			cltrs.toFixed(2),
			r.violations
		])
	);
const mean = (rs: Row[], f: (r: Row) => number) => rs.reduce((s, r) => s + f(r), 0) / rs.length;
function summary(label: string, group: Row[]): void {
	if (group.length === 0) return;
	printRow(
		label,
		{
			n: group.reduce((s, r) => s + r.n, 0),
			util: mean(group, (r) => r.util),
			meanMs: mean(group, (r) => r.meanMs),
			maxMs: Math.max(...group.map((r) => r.maxMs)),
			cpuMs: mean(group, (r) => r.cpuMs),
			violations: group.reduce((s, r) => s + r.violations, 0)
		},
		mean(group, (r) => PUBLISHED[r.set]!.best),
		mean(group, (r) => PUBLISHED[r.set]!.cltrs)
	);
}
for (const set of sets) {
	const r = runSet(set);
	rows.push(r);
	const pub = PUBLISHED[set] ?? { best: NaN, cltrs: NaN };
	printRow(`BR${set}`, r, pub.best, pub.cltrs);
	if (set === 7 || (set === sets[sets.length - 1] && set < 7)) {
		summary(
			'**BR1–BR7**',
			rows.filter((x) => x.set >= 1 && x.set <= 7)
		);
	}
}
summary(
	'**BR8–BR15**',
	rows.filter((x) => x.set >= 8)
);
console.log('');
console.log(
	'Best full-support figures and sources: scripts/bench/load-published.ts (from the data README).'
);
