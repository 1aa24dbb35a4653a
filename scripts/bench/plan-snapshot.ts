// Plans a fixed set of inputs and writes their JSON, so a change to the load planner can be shown
// to leave its plans unchanged: run it before and after, then `cmp` the two files.
//   node_modules/.bin/tsx scripts/bench/plan-snapshot.ts /tmp/plans-before.json   (from the root)
// The set: the bench's 240-carton body at three scales and three count shifts, and the first
// three problems of Bischoff & Ratcliff sets 1, 4, 7, 10 and 15 (../shared/benchmarks).
// Timings (elapsedMs, the search's own figures) are left out: they differ run to run.
import { writeFileSync } from 'node:fs';
import { planLoad, type LoadPlanInput } from '../../src/lib/load-plan';
import { loadPlanInputSchema } from '../../src/lib/schemas/load-plan';
import { brInput, readBrSet } from './load-br';
import { calcLoadPlanBody } from './load-plan-input';

const out = process.argv[2];
if (!out) {
	console.error('Usage: tsx scripts/bench/plan-snapshot.ts OUT.json');
	process.exit(2);
}
const inputs: LoadPlanInput[] = [];
const base = calcLoadPlanBody();
for (const scale of [1, 2, 4])
	for (const shift of [0, 7, 13]) {
		const body = structuredClone(base);
		body.items.forEach((it, i) => (it.count = Math.max(1, it.count * scale - shift * (i + 1))));
		inputs.push(loadPlanInputSchema.parse(body) as LoadPlanInput);
	}
for (const set of [1, 4, 7, 10, 15])
	for (const problem of readBrSet('../shared/benchmarks/container-loading', set).slice(0, 3))
		inputs.push(brInput(problem, 100));
const plans = inputs.map((input) => {
	const result = planLoad(input);
	if (result.ok) delete (result.plan as { search?: unknown }).search;
	return JSON.stringify(result, (k, v) => (k === 'elapsedMs' ? undefined : v));
});
writeFileSync(out, JSON.stringify(plans, null, 1));
console.log(`${plans.length} plans written to ${out}`);
