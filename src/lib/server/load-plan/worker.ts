/**
 * The load planner's worker thread. This module is loaded twice: in the main thread only for
 * WORKER_URL (its own file, wherever the build put it), and as the worker itself, where it plans
 * each job the runner posts, one at a time, and posts progress and the result back. The worker
 * stays up between jobs, so later jobs skip the start-up and run on warm (JIT-compiled) code.
 */
import { isMainThread, parentPort, workerData } from 'node:worker_threads';
import { planLoad, type LoadPlanInput, type LoadPlanProgress } from '../../load-plan';
import type { RunResult } from './run-result';

export const WORKER_URL = import.meta.url;
export const JOB_TAG = 'landfall-load-plan';

export type WorkerJob = { type: 'job'; input: LoadPlanInput };
export type WorkerMessage =
	{ type: 'progress'; progress: LoadPlanProgress } | { type: 'result'; result: RunResult };

/** Progress at most this often: the planner may report many improvements per second. */
const PROGRESS_EVERY_MS = 150;

if (!isMainThread && parentPort && workerData?.tag === JOB_TAG) {
	const port = parentPort;
	port.on('message', ({ input }: WorkerJob) => {
		let last = -Infinity;
		const result = planLoad({
			...input,
			options: {
				...input.options,
				onProgress: (progress) => {
					if (progress.elapsedMs - last < PROGRESS_EVERY_MS) return;
					last = progress.elapsedMs;
					port.postMessage({ type: 'progress', progress } satisfies WorkerMessage);
				}
			}
		});
		// The plan as JSON text: copying one string to the main thread is far cheaper than
		// cloning the plan's objects, and the API sends that text as it is.
		const sent: RunResult = result.ok
			? { ok: true, problems: result.problems, planJson: JSON.stringify(result.plan) }
			: result;
		port.postMessage({ type: 'result', result: sent } satisfies WorkerMessage);
	});
}
