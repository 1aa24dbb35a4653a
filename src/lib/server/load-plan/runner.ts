/**
 * Runs planLoad in a worker thread, so a search of a few seconds never blocks the requests of
 * others. One worker at a time per process (the machine's cores serve the requests too); later
 * jobs wait in a queue bounded by the search time they ask for. The worker is kept between jobs
 * (starting one and compiling the planner cost about 100 ms, more than a small plan) and stopped
 * after a minute idle. A worker that crashes, runs out of memory or overruns its time is stopped
 * and reported as a plain refusal, never as an exception with a stack; the next job gets a new one.
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

/**
 * Search time the waiting jobs may ask for in all, ms; a job beyond it is refused (the server is
 * busy). Eight searches of the default 3 s, or many more small ones.
 */
export const MAX_QUEUED_BUDGET_MS = 8 * DEFAULT_TIME_BUDGET_MS;
/** Waiting jobs, whatever their budgets: each holds its input in memory. */
export const MAX_QUEUED = 64;
/** Time the worker may take beyond the planner's own budget (start-up, dressing the plan). */
const GRACE_MS = 15_000;
const MEMORY_MB = 512;
/** A worker idle this long is stopped, giving its memory back. */
const IDLE_MS = 60_000;

let tail: Promise<unknown> = Promise.resolve();
let waiting = 0;
let waitingBudgetMs = 0;
/** The worker kept from the last job that finished well, with its idle timer. */
let idle: { worker: Worker; timer: NodeJS.Timeout } | null = null;

async function workerUrl(): Promise<URL> {
	// A dynamic import keeps the worker module in a chunk of its own in the server build.
	const { WORKER_URL } = await import('./worker');
	return new URL(WORKER_URL);
}

function startWorker(url: URL): Worker {
	const resourceLimits = { maxOldGenerationSizeMb: MEMORY_MB };
	const workerData = { tag: JOB_TAG };
	let worker: Worker;
	if (!url.pathname.endsWith('.ts')) worker = new Worker(url, { workerData, resourceLimits });
	else {
		// Under vite dev and vitest the module is still TypeScript: tsx (a dev dependency, resolved
		// from the project root, the working directory there) loads it.
		const boot = `import('tsx/esm/api').then((m) => { m.register(); return import(${JSON.stringify(url.href)}); })`;
		worker = new Worker(boot, { eval: true, workerData, resourceLimits });
	}
	// A kept worker that dies while idle is simply not used again.
	worker.on('error', () => {});
	worker.once('exit', () => {
		if (idle?.worker === worker) {
			clearTimeout(idle.timer);
			idle = null;
		}
	});
	return worker;
}

/** The kept worker, or a new one. */
function takeWorker(url: URL): Worker {
	if (!idle) return startWorker(url);
	const { worker, timer } = idle;
	idle = null;
	clearTimeout(timer);
	worker.ref();
	return worker;
}

/** Keeps a worker that finished its job well for the next one; it never holds the process open. */
function keepWorker(worker: Worker): void {
	worker.unref();
	const timer = setTimeout(() => void worker.terminate(), IDLE_MS);
	timer.unref();
	idle = { worker, timer };
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
		const worker = takeWorker(url);
		const finish = (outcome: RunOutcome, keep = false) => {
			if (settled) return;
			settled = true;
			clearTimeout(timer);
			worker.off('message', onMessage);
			worker.off('error', onError);
			worker.off('exit', onExit);
			if (keep) keepWorker(worker);
			else void worker.terminate();
			resolve(outcome);
		};
		const onMessage = (m: import('./worker').WorkerMessage) => {
			if (m.type === 'progress') onProgress(m.progress);
			else finish({ ok: true, result: m.result }, true);
		};
		const onError = (e: Error) =>
			finish({
				ok: false,
				code: 'crashed',
				message: `The load planner stopped unexpectedly (${e.name}${/memory/i.test(e.message) ? ': out of memory' : ''}). Try again, or plan fewer pieces.`
			});
		const onExit = (code: number) =>
			finish({
				ok: false,
				code: 'crashed',
				message: `The load planner stopped unexpectedly (exit code ${code}). Try again.`
			});
		const timer = setTimeout(
			() =>
				finish({
					ok: false,
					code: 'timeout',
					message: `The load planner did not finish within ${Math.round((budget + graceMs) / 1000)} s and was stopped. Try again, or plan fewer pieces.`
				}),
			budget + graceMs
		);
		worker.on('message', onMessage);
		worker.on('error', onError);
		worker.on('exit', onExit);
		try {
			worker.postMessage({ type: 'job', input } satisfies import('./worker').WorkerJob);
		} catch (e) {
			// An input that cannot be copied to the worker (a function, say).
			finish({
				ok: false,
				code: 'crashed',
				message: `The load planner could not start (${(e as Error).name}).`
			});
		}
	});
}

/** Plans `input` in a worker once the jobs before it are done. */
export function runLoadPlan(
	input: LoadPlanInput,
	onProgress: (p: LoadPlanProgress) => void = () => {},
	{ graceMs = GRACE_MS }: { graceMs?: number } = {}
): Promise<RunOutcome> {
	const budget = input.options?.timeBudgetMs ?? DEFAULT_TIME_BUDGET_MS;
	// The first to wait is always admitted, whatever it asks for; more wait while their budgets fit.
	if (waiting > 0 && (waiting >= MAX_QUEUED || waitingBudgetMs + budget > MAX_QUEUED_BUDGET_MS)) {
		return Promise.resolve({
			ok: false,
			code: 'busy',
			message: 'The load planner is busy with other plans. Try again in a minute.'
		});
	}
	waiting++;
	waitingBudgetMs += budget;
	const job = tail.then(async () => {
		waiting--;
		waitingBudgetMs -= budget;
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
