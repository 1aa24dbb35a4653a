/**
 * Runs planLoad in a worker thread, so a search of a few seconds never blocks the requests of
 * others. One worker at a time per process (the machine's cores serve the requests too); later
 * jobs wait in a short queue. A worker that crashes, runs out of memory or overruns its time is
 * stopped and reported as a plain refusal, never as an exception with a stack.
 */
import { Worker } from 'node:worker_threads';
import {
	DEFAULT_TIME_BUDGET_MS,
	type LoadPlanInput,
	type LoadPlanProgress,
	type LoadPlanResult
} from '../../load-plan';

/** Same as worker.ts's JOB_TAG (not imported: that would pull the worker into this chunk). */
const JOB_TAG = 'landfall-load-plan';

export type RunOutcome =
	| { ok: true; result: LoadPlanResult }
	| { ok: false; code: 'busy' | 'timeout' | 'crashed'; message: string };

/** Jobs waiting behind the running one; more are refused (the server is busy). */
export const MAX_QUEUED = 8;
/** Time the worker may take beyond the planner's own budget (start-up, dressing the plan). */
const GRACE_MS = 15_000;
const MEMORY_MB = 512;

let tail: Promise<unknown> = Promise.resolve();
let waiting = 0;

async function workerUrl(): Promise<URL> {
	// A dynamic import keeps the worker module in a chunk of its own in the server build.
	const { WORKER_URL } = await import('./worker');
	return new URL(WORKER_URL);
}

function startWorker(url: URL, workerData: unknown): Worker {
	const resourceLimits = { maxOldGenerationSizeMb: MEMORY_MB };
	if (!url.pathname.endsWith('.ts')) return new Worker(url, { workerData, resourceLimits });
	// Under vite dev and vitest the module is still TypeScript: tsx (a dev dependency, resolved
	// from the project root, the working directory there) loads it.
	const boot = `import('tsx/esm/api').then((m) => { m.register(); return import(${JSON.stringify(url.href)}); })`;
	return new Worker(boot, { eval: true, workerData, resourceLimits });
}

function runOnce(
	input: LoadPlanInput,
	onProgress: (p: LoadPlanProgress) => void,
	url: URL,
	graceMs: number
): Promise<RunOutcome> {
	const budget = input.options?.timeBudgetMs ?? DEFAULT_TIME_BUDGET_MS;
	return new Promise((resolve) => {
		let settled = false;
		const worker = startWorker(url, { tag: JOB_TAG, input });
		const finish = (outcome: RunOutcome) => {
			if (settled) return;
			settled = true;
			clearTimeout(timer);
			void worker.terminate();
			resolve(outcome);
		};
		const timer = setTimeout(
			() =>
				finish({
					ok: false,
					code: 'timeout',
					message: `The load planner did not finish within ${Math.round((budget + graceMs) / 1000)} s and was stopped. Try again, or plan fewer pieces.`
				}),
			budget + graceMs
		);
		worker.on('message', (m: import('./worker').WorkerMessage) => {
			if (m.type === 'progress') onProgress(m.progress);
			else finish({ ok: true, result: m.result });
		});
		worker.on('error', (e) =>
			finish({
				ok: false,
				code: 'crashed',
				message: `The load planner stopped unexpectedly (${e.name}${/memory/i.test(e.message) ? ': out of memory' : ''}). Try again, or plan fewer pieces.`
			})
		);
		worker.on('exit', (code) =>
			finish({
				ok: false,
				code: 'crashed',
				message: `The load planner stopped unexpectedly (exit code ${code}). Try again.`
			})
		);
	});
}

/** Plans `input` in a worker once the jobs before it are done. */
export function runLoadPlan(
	input: LoadPlanInput,
	onProgress: (p: LoadPlanProgress) => void = () => {},
	{ graceMs = GRACE_MS }: { graceMs?: number } = {}
): Promise<RunOutcome> {
	if (waiting >= MAX_QUEUED) {
		return Promise.resolve({
			ok: false,
			code: 'busy',
			message: 'The load planner is busy with other plans. Try again in a minute.'
		});
	}
	waiting++;
	const job = tail.then(async () => {
		waiting--;
		try {
			return await runOnce(input, onProgress, await workerUrl(), graceMs);
		} catch (e) {
			return {
				ok: false as const,
				code: 'crashed' as const,
				message: `The load planner could not start (${(e as Error).name}).`
			};
		}
	});
	tail = job;
	return job;
}
