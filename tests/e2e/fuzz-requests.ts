import fc from 'fast-check';
import * as devalue from 'devalue';
import {
	MALFORMED_JSON,
	WRONG_CONTENT_TYPES,
	applyJsonMutation,
	hostileText,
	jsonMutation,
	toJsonText,
	type JsonMutation
} from './fuzz-values';

// fast-check cases for the fuzzer and the HTTP requests they become: form actions (flat fields,
// multipart, superforms' __superform_json, or garbage), JSON API bodies and query strings.

export interface RawRequest {
	headers: Record<string, string>;
	data?: string | Buffer;
}

type FieldOp =
	| { op: 'set'; value: string }
	| { op: 'drop' }
	| { op: 'twice'; value: string }
	| { op: 'file'; name: string; bytes: Uint8Array };

const FILE_NAMES = [
	'../../etc/passwd',
	'..\\..\\boot.ini',
	'/abs/path.pdf',
	'a\u0000b.pdf',
	'<script>.pdf',
	'x'.repeat(300) + '.pdf',
	'',
	'CON.pdf',
	'.htaccess',
	'résumé 📄.pdf'
];

const fieldOp: fc.Arbitrary<FieldOp> = fc.oneof(
	{ weight: 6, arbitrary: hostileText.map((value) => ({ op: 'set' as const, value })) },
	{ weight: 1, arbitrary: fc.constant({ op: 'drop' as const }) },
	{ weight: 1, arbitrary: hostileText.map((value) => ({ op: 'twice' as const, value })) },
	{
		weight: 1,
		arbitrary: fc.record({
			op: fc.constant('file' as const),
			name: fc.constantFrom(...FILE_NAMES),
			bytes: fc.oneof(
				fc.uint8Array({ maxLength: 64 }),
				fc.constant(new TextEncoder().encode('%PDF-1.4\n%garbage')),
				fc.constant(new TextEncoder().encode('<html><script>1</script>'))
			)
		})
	}
);

/** A fuzzed form post: how it is encoded and what it changes in the known-good fields. */
export type FormCase =
	| { encoding: 'urlencoded' | 'multipart'; ops: [number, FieldOp][]; extras: [string, string][] }
	| { encoding: 'superjson'; mutation: JsonMutation }
	| { encoding: 'superjson-raw'; json: string }
	| { encoding: 'garbage'; contentType: string; body: string };

const GARBAGE_FORMS = [
	'%E0%A4%A',
	'&&&=&=x&',
	'a[b][c]=1&a[]=2',
	'%',
	'\u0000=\u0000',
	'--nothing\r\nContent-Disposition: form-data\r\n\r\nx',
	'x='.repeat(20_000)
];

/** Hand-made __superform_json: cycles, devalue's NaN / ±Infinity / -0 / undefined, odd types. */
function rawSuperJson(keys: string[]): fc.Arbitrary<string> {
	const key = keys.length ? fc.constantFrom(...keys) : fc.constant('x');
	return fc.oneof(
		fc
			.tuple(key, fc.constantFrom(0, -1, -2, -3, -4, -5, -6))
			.map(([k, special]) => JSON.stringify([{ [k]: special }])),
		fc.constantFrom(
			'[["BigInt","x"]]',
			'[["Date","not a date"]]',
			'[["Set",1],"x"]',
			'[["Map",1,2],"k","v"]',
			'[["RegExp","(a+)+$"]]',
			'[[1,1]]',
			'not devalue',
			'[',
			''
		)
	);
}

export function formCase(base: Record<string, unknown>): fc.Arbitrary<FormCase> {
	const keys = Object.keys(base);
	const flat = (encoding: 'urlencoded' | 'multipart') =>
		fc.record({
			encoding: fc.constant(encoding),
			ops: fc.array(fc.tuple(fc.nat(), fieldOp), { minLength: 1, maxLength: 4 }),
			extras: fc.array(fc.tuple(hostileText, hostileText), { maxLength: 2 })
		});
	return fc.oneof(
		{ weight: 3, arbitrary: flat('urlencoded') },
		{ weight: 3, arbitrary: flat('multipart') },
		{
			weight: 3,
			arbitrary: fc.record({ encoding: fc.constant('superjson' as const), mutation: jsonMutation })
		},
		{
			weight: 1,
			arbitrary: fc.record({
				encoding: fc.constant('superjson-raw' as const),
				json: rawSuperJson(keys)
			})
		},
		{
			weight: 1,
			arbitrary: fc.record({
				encoding: fc.constant('garbage' as const),
				contentType: fc.constantFrom(
					'application/x-www-form-urlencoded',
					'multipart/form-data; boundary=nothing',
					'text/plain',
					'application/json'
				),
				body: fc.oneof(fc.constantFrom(...GARBAGE_FORMS), hostileText)
			})
		}
	);
}

/** A value as a browser form would send it: arrays as repeated fields, objects as JSON. */
function flatValues(value: unknown): string[] {
	if (value === undefined || value === null) return [];
	if (Array.isArray(value))
		return value.flatMap((v) => (typeof v === 'object' ? [] : flatValues(v)));
	if (typeof value === 'object') return [JSON.stringify(value)];
	return [String(value)];
}

function multipartBody(parts: [string, string | { name: string; bytes: Uint8Array }][]) {
	const boundary = '----landfall-fuzz-boundary-7f3a';
	const chunks: Buffer[] = [];
	for (const [name, value] of parts) {
		const quoted = name.replace(/["\r\n]/g, '_');
		if (typeof value === 'string') {
			chunks.push(
				Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="${quoted}"\r\n\r\n`),
				Buffer.from(value),
				Buffer.from('\r\n')
			);
		} else {
			const file = value.name.replace(/["\r\n]/g, '_');
			chunks.push(
				Buffer.from(
					`--${boundary}\r\nContent-Disposition: form-data; name="${quoted}"; filename="${file}"\r\n` +
						'Content-Type: application/octet-stream\r\n\r\n'
				),
				Buffer.from(value.bytes),
				Buffer.from('\r\n')
			);
		}
	}
	chunks.push(Buffer.from(`--${boundary}--\r\n`));
	return { type: `multipart/form-data; boundary=${boundary}`, data: Buffer.concat(chunks) };
}

/** The request body and headers of a form case, sent as use:enhance does (JSON result). */
export function formRequest(
	base: Record<string, unknown>,
	formId: string | undefined,
	c: FormCase
): RawRequest {
	const headers: Record<string, string> = {
		'x-sveltekit-action': 'true',
		accept: 'application/json'
	};
	if (c.encoding === 'garbage') {
		return { headers: { ...headers, 'content-type': c.contentType }, data: c.body };
	}
	if (c.encoding === 'superjson' || c.encoding === 'superjson-raw') {
		let json: string;
		if (c.encoding === 'superjson-raw') json = c.json;
		else {
			const mutated = applyJsonMutation(base, c.mutation);
			try {
				json = devalue.stringify(mutated);
			} catch {
				json = JSON.stringify(mutated);
			}
		}
		const params = new URLSearchParams({ __superform_json: json });
		if (formId) params.set('__superform_id', formId);
		return {
			headers: { ...headers, 'content-type': 'application/x-www-form-urlencoded' },
			data: params.toString()
		};
	}
	const keys = Object.keys(base);
	const fields = new Map<string, (string | { name: string; bytes: Uint8Array })[]>(
		keys.map((k) => [k, flatValues(base[k])])
	);
	for (const [n, op] of c.ops) {
		const key = keys.length ? keys[n % keys.length]! : 'x';
		if (op.op === 'drop') fields.delete(key);
		else if (op.op === 'set') fields.set(key, [op.value]);
		else if (op.op === 'twice') fields.set(key, [op.value, op.value]);
		else if (c.encoding === 'multipart') fields.set(key, [{ name: op.name, bytes: op.bytes }]);
	}
	for (const [key, value] of c.extras) fields.set(key, [value]);
	if (formId && fields.size > 0) fields.set('__superform_id', [formId]);
	const parts = [...fields].flatMap(([k, vs]) => vs.map((v) => [k, v] as [string, typeof v]));
	if (c.encoding === 'multipart') {
		const body = multipartBody(parts);
		return { headers: { ...headers, 'content-type': body.type }, data: body.data };
	}
	const params = new URLSearchParams();
	for (const [k, v] of parts) if (typeof v === 'string') params.append(k, v);
	return {
		headers: { ...headers, 'content-type': 'application/x-www-form-urlencoded' },
		data: params.toString()
	};
}

/** A fuzzed JSON API body: a mutation of the known-good body, malformed JSON, or a wrong type. */
export type ApiCase =
	| { kind: 'mutation'; mutation: JsonMutation }
	| { kind: 'malformed'; body: string }
	| { kind: 'content-type'; contentType: string; mutation: JsonMutation };

export const apiCase: fc.Arbitrary<ApiCase> = fc.oneof(
	{
		weight: 6,
		arbitrary: fc.record({ kind: fc.constant('mutation' as const), mutation: jsonMutation })
	},
	{
		weight: 1,
		arbitrary: fc.record({
			kind: fc.constant('malformed' as const),
			body: fc.oneof(fc.constantFrom(...MALFORMED_JSON), hostileText)
		})
	},
	{
		weight: 1,
		arbitrary: fc.record({
			kind: fc.constant('content-type' as const),
			contentType: fc.constantFrom(...WRONG_CONTENT_TYPES),
			mutation: jsonMutation
		})
	}
);

export function apiRequest(base: unknown, c: ApiCase): RawRequest {
	if (c.kind === 'malformed') {
		return { headers: { 'content-type': 'application/json' }, data: c.body };
	}
	const data = toJsonText(applyJsonMutation(base, c.mutation));
	const contentType = c.kind === 'content-type' ? c.contentType : 'application/json';
	return { headers: contentType ? { 'content-type': contentType } : {}, data };
}

/** A fuzzed query string: known parameters changed, dropped, repeated or added, or garbage. */
export type QueryCase =
	| { kind: 'params'; ops: [number, FieldOp][]; extras: [string, string][] }
	| { kind: 'raw'; query: string };

const RAW_QUERIES = [
	'%',
	'%E0%A4%A',
	'&&&',
	'=x',
	'a[b]=1',
	'?',
	'#',
	'%00=%00',
	'x=' + 'y'.repeat(8_000)
];

export const queryCase: fc.Arbitrary<QueryCase> = fc.oneof(
	{
		weight: 5,
		arbitrary: fc.record({
			kind: fc.constant('params' as const),
			ops: fc.array(fc.tuple(fc.nat(), fieldOp), { minLength: 1, maxLength: 4 }),
			extras: fc.array(fc.tuple(hostileText, hostileText), { maxLength: 2 })
		})
	},
	{
		weight: 1,
		arbitrary: fc.record({
			kind: fc.constant('raw' as const),
			query: fc.constantFrom(...RAW_QUERIES)
		})
	}
);

/** The query string (without "?") of a query case against the known-good parameters. */
export function queryString(base: Record<string, string>, c: QueryCase): string {
	if (c.kind === 'raw') return c.query;
	const keys = Object.keys(base);
	const params = new Map<string, string[]>(keys.map((k) => [k, base[k] ? [base[k]] : []]));
	for (const [n, op] of c.ops) {
		const key = keys.length ? keys[n % keys.length]! : 'q';
		if (op.op === 'drop') params.delete(key);
		else if (op.op === 'set') params.set(key, [op.value]);
		else if (op.op === 'twice') params.set(key, [op.value, op.value]);
	}
	for (const [key, value] of c.extras) params.set(key, [value]);
	const search = new URLSearchParams();
	for (const [k, vs] of params) for (const v of vs) search.append(k, v);
	return search.toString();
}
