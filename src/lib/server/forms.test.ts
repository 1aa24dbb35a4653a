import { describe, expect, it } from 'vitest';
import { isHttpError } from '@sveltejs/kit';
import * as devalue from 'devalue';
import { zod4 } from 'sveltekit-superforms/adapters';
import { z } from 'zod';
import { readForm, validateForm } from './forms';

// Regressions from the fuzzer (tests/e2e/fuzz.spec.ts): each body below made a form action answer
// 500 (or a 400 naming no field) before validateForm and readForm. "common practice": a
// malformed request is the client's fault, a 4xx that says what is wrong.

const schema = z.object({
	name: z.string().trim().min(1, 'Enter the name.'),
	lines: z.array(z.object({ sku: z.string() })).default([]),
	modes: z.array(z.string()).default([]),
	version: z.number().int().min(0)
});
const adapter = zod4(schema);

const post = (body: BodyInit, contentType?: string) =>
	new Request('http://landfall.test/x', {
		method: 'POST',
		body,
		headers: contentType ? { 'content-type': contentType } : {}
	});
const fields = (entries: Record<string, string>) => new URLSearchParams(entries);
const superJson = (json: string) => fields({ __superform_json: json });

describe('validateForm', () => {
	it('passes a well-formed form, plain or as superforms JSON', async () => {
		const plain = await validateForm(post(fields({ name: 'Pebble', version: '2' })), adapter);
		expect(plain).toMatchObject({ valid: true, data: { name: 'Pebble', version: 2 } });
		const json = devalue.stringify({ name: 'Hub', lines: [{ sku: 'A' }], version: 0 });
		const nested = await validateForm(post(superJson(json)), adapter);
		expect(nested).toMatchObject({ valid: true, data: { lines: [{ sku: 'A' }] } });
	});

	it('refuses a body that is not form data, with a form-level error', async () => {
		for (const request of [
			post('name=x', 'text/plain'),
			post('%', 'multipart/form-data; boundary=nothing'),
			post('{"name":"x"}', 'application/json')
		]) {
			const form = await validateForm(request, adapter);
			expect(form.valid).toBe(false);
			expect(form.posted).toBe(true);
			expect(form.errors._errors?.[0]).toMatch(/could not be read/);
		}
	});

	it('refuses a list posted as a plain field, on that field (superforms threw SchemaError)', async () => {
		const form = await validateForm(post(fields({ name: 'x', lines: '[object]' })), adapter);
		expect(form.valid).toBe(false);
		expect(form.errors.lines).toBeDefined();
	});

	it('refuses cyclic or exotic superforms JSON (a cycle overflowed the stack)', async () => {
		for (const [json, field] of [
			['[{"name":0}]', 'name'],
			['[{"name":1,"version":2},"x",["BigInt","7"]]', 'version'],
			['[{"name":1},["Date","2026-01-01"]]', 'name']
		] as const) {
			const form = await validateForm(post(superJson(json)), adapter);
			expect(form.valid, json).toBe(false);
			expect(form.errors[field], json).toBeDefined();
		}
	});

	it('refuses a file in a text field and drops it (it could not be sent back)', async () => {
		const data = new FormData();
		data.set('name', 'Pebble');
		data.append('modes', 'air');
		data.append('modes', new File(['x'], 'evil.pdf'));
		data.set('version', '0');
		const form = await validateForm(post(data), adapter);
		expect(form.valid).toBe(false);
		expect(JSON.stringify(form.errors.modes)).toMatch(/A file cannot go in this field/);
		expect(form.data.modes).toEqual(['air', undefined]);
	});

	it('keeps a file where the form takes one', async () => {
		const upload = zod4(z.object({ file: z.instanceof(File) }));
		const data = new FormData();
		data.set('file', new File(['%PDF-1.4'], 'a.pdf'));
		const form = await validateForm(post(data), upload, { files: ['file'] });
		expect(form.valid).toBe(true);
		expect(form.data.file).toBeInstanceOf(File);
	});

	// PostgreSQL 15 documentation, 8.3 "Character Types": the NUL character cannot be stored.
	it('refuses NUL in any text, on its field (PostgreSQL refused the insert: a 500)', async () => {
		const form = await validateForm(post(fields({ name: 'Bre\u0000men', version: '0' })), adapter);
		expect(form.valid).toBe(false);
		expect(form.errors.name?.[0]).toMatch(/NUL/);
		const json = devalue.stringify({ name: 'ok', lines: [{ sku: 'a\u0000' }], version: 0 });
		const nested = await validateForm(post(superJson(json)), adapter);
		expect(nested.valid).toBe(false);
		expect(JSON.stringify(nested.errors)).toMatch(/NUL/);
	});
});

describe('readForm', () => {
	it('answers 400 for a body that is not form data, instead of throwing a TypeError', async () => {
		const thrown = await readForm(post('x', 'text/plain')).catch((e: unknown) => e);
		expect(isHttpError(thrown, 400)).toBe(true);
	});

	it('reads a well-formed form', async () => {
		expect((await readForm(post(fields({ a: '1' })))).get('a')).toBe('1');
	});
});
