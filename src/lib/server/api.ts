import { error, json } from '@sveltejs/kit';
import type { z } from 'zod';
import type { ServiceResult } from './services/result';
import { NUL_MESSAGE, nulPaths } from '../schemas/nul-text';

/** Parses a JSON body against a schema; anything else is a 400 naming each bad field's path. */
export async function readJson<S extends z.ZodType>(
	request: Request,
	schema: S
): Promise<z.infer<S>> {
	let body: unknown;
	try {
		body = await request.json();
	} catch {
		error(400, { message: 'The request body must be a JSON object.', code: 'invalid_json' });
	}
	const parsed = schema.safeParse(body);
	if (!parsed.success) {
		error(400, {
			message: 'Some fields are missing or invalid.',
			code: 'invalid_body',
			issues: parsed.error.issues.map((issue) => ({
				path: issue.path.map(String).join('.'),
				message: issue.message
			}))
		});
	}
	const nul = nulPaths(parsed.data);
	if (nul.length) {
		error(400, {
			message: 'Some fields are missing or invalid.',
			code: 'invalid_body',
			issues: nul.map((path) => ({ path: path.map(String).join('.'), message: NUL_MESSAGE }))
		});
	}
	return parsed.data;
}

/** Turns a service result into a JSON response (the value, or a 4xx with field paths). */
export function respond<T>(result: ServiceResult<T>, status = 200): Response {
	if (result.ok) return json(result.value, { status });
	error(result.status, {
		message: result.message,
		code:
			{ 403: 'forbidden', 404: 'not_found', 409: 'conflict', 502: 'upstream', 503: 'unavailable' }[
				result.status as 403
			] ?? 'invalid_body',
		issues: Object.entries(result.fieldErrors).map(([path, message]) => ({ path, message }))
	});
}

/** A positive whole number from the query string, or the default; garbage is a 400. */
export function queryInt(url: URL, name: string, fallback: number, max: number): number {
	const raw = url.searchParams.get(name);
	if (raw === null || raw === '') return fallback;
	if (!/^\d{1,9}$/.test(raw) || Number(raw) > max) {
		error(400, {
			message: `Query parameter “${name}” must be a whole number from 0 to ${max}.`,
			code: 'invalid_query',
			issues: [{ path: name, message: `Expected a whole number from 0 to ${max}.` }]
		});
	}
	return Number(raw);
}
