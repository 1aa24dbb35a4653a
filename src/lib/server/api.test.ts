import { describe, expect, it } from 'vitest';
import { isHttpError } from '@sveltejs/kit';
import { z } from 'zod';
import { readJson } from './api';

const schema = z.object({ name: z.string(), notes: z.array(z.string()).default([]) });
const body = (text: string) =>
	new Request('http://landfall.test/api/v1/x', { method: 'POST', body: text });

describe('readJson', () => {
	// PostgreSQL 15 documentation, 8.3 "Character Types": the NUL character cannot be stored, so
	// a NUL that passed the schema failed the insert with a 500 (found by tests/e2e/fuzz.spec.ts).
	it('refuses NUL in any string with a 400 naming its path', async () => {
		const thrown = await readJson(
			body(JSON.stringify({ name: 'ok', notes: ['x', 'a\u0000b'] })),
			schema
		).catch((e: unknown) => e);
		expect(isHttpError(thrown, 400)).toBe(true);
		expect(isHttpError(thrown) && thrown.body).toMatchObject({
			code: 'invalid_body',
			issues: [{ path: 'notes.1', message: expect.stringMatching(/NUL/) }]
		});
	});

	it('passes a body without NUL', async () => {
		expect(await readJson(body('{"name":"Pebble"}'), schema)).toEqual({
			name: 'Pebble',
			notes: []
		});
	});
});
