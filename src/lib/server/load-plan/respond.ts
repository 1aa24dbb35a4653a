import { error, json } from '@sveltejs/kit';
import type { LoadPlanOutcome, LoadPlanRefusal } from '../services/load-plan';

/** A refused plan as the API's JSON error: `{ message, code, issues }` with its status. */
export function refuse(r: LoadPlanRefusal): never {
	error(r.status, { message: r.message, code: r.code, issues: r.issues });
}

export function respondPlan(outcome: LoadPlanOutcome): Response {
	if (!outcome.ok) refuse(outcome);
	return json(outcome.value);
}

/**
 * NDJSON: one `{ type: 'progress', progress }` line per report of the search, then one
 * `{ type: 'result', value }` or `{ type: 'error', status, message, code, issues }` line.
 */
export function streamPlan(
	run: (onProgress: (progress: unknown) => void) => Promise<LoadPlanOutcome>
): Response {
	const encoder = new TextEncoder();
	const body = new ReadableStream<Uint8Array>({
		async start(controller) {
			let open = true;
			const send = (line: unknown) => {
				if (open) controller.enqueue(encoder.encode(`${JSON.stringify(line)}\n`));
			};
			const outcome = await run((progress) => send({ type: 'progress', progress }));
			if (outcome.ok) send({ type: 'result', value: outcome.value });
			else {
				const { status, message, code, issues } = outcome;
				send({ type: 'error', status, message, code, issues });
			}
			open = false;
			controller.close();
		}
	});
	return new Response(body, {
		headers: { 'content-type': 'application/x-ndjson', 'cache-control': 'no-store' }
	});
}
