import fc from 'fast-check';

// Hostile values for the fuzzer (fuzz.spec.ts): what a broken or malicious client puts in a
// field, and mutations of a known-good body or form that replace, drop or add fields.

/** Marks a string that is written into a JSON body as a bare literal, e.g. the number 1e309. */
const RAW = '\u0001raw:';

/** Text a hostile client sends in any field. */
export const HOSTILE_TEXT = [
	'',
	' ',
	' \t\n ',
	'x'.repeat(5_000),
	'y'.repeat(100_000),
	'a\u0000b',
	'\u0000',
	'%00',
	'\u0001\u0007\u001b[31m',
	'\uD800', // a lone surrogate
	'\u202Eevil\u202C', // bidi override
	'\uFEFFbom',
	'𝕊𝕙𝕚𝕡 🚢📦',
	'Z̷̡̛a̶l̵g̸o̴',
	'é'.normalize('NFD'),
	'1e309',
	'-1e309',
	'-0',
	'NaN',
	'Infinity',
	'-1',
	'0',
	'1.5',
	'1,5',
	' 12 ',
	'0x1F',
	'9'.repeat(40),
	'-9007199254740993',
	'true',
	'null',
	'undefined',
	'[]',
	'{}',
	'[object Object]',
	'2026-02-30',
	'0000-00-00',
	'9999-12-31T23:59:59Z',
	'00000000-0000-4000-8000-000000000000',
	'00000000-0000-0000-0000-00000000000g',
	"'; DROP TABLE shipments;--",
	"' OR '1'='1",
	'1; SELECT pg_sleep(5)',
	'<script>window.__pwned=1</script>',
	'<img src=x onerror=window.__pwned=1>',
	'"><svg onload=alert(1)>',
	'{{7*7}}',
	'${7*7}',
	'#{7*7}',
	'../../etc/passwd',
	'C:\\Windows\\win.ini',
	'__proto__',
	'constructor'
];

/** A hostile string: a known nasty one, or random text (any code point, lone surrogates too). */
export const hostileText: fc.Arbitrary<string> = fc.oneof(
	{ weight: 6, arbitrary: fc.constantFrom(...HOSTILE_TEXT) },
	{ weight: 1, arbitrary: fc.string({ maxLength: 30, unit: 'binary' }) },
	{ weight: 1, arbitrary: fc.string({ maxLength: 30, unit: 'grapheme' }) }
);

/** Number literals JSON.parse turns into Infinity, 0 or a rounded value. */
const RAW_NUMBERS = ['1e309', '-1e309', '-0', '1e-400', '123456789012345678901234567890.5'];

/** A hostile JSON value: wrong types, extremes, nesting, and the hostile strings. */
export const hostileJson: fc.Arbitrary<unknown> = fc.oneof(
	{ weight: 4, arbitrary: hostileText },
	{
		weight: 3,
		arbitrary: fc.constantFrom<unknown>(
			null,
			true,
			false,
			0,
			-1,
			1.5,
			1e308,
			-1e308,
			2 ** 53 + 2,
			[],
			{},
			[[[]]],
			{ a: { b: { c: {} } } },
			['x', 1, null],
			JSON.parse('{"__proto__":{"polluted":true}}') as unknown
		)
	},
	{ weight: 1, arbitrary: fc.constantFrom(...RAW_NUMBERS.map((n) => RAW + n)) },
	{ weight: 1, arbitrary: fc.integer() },
	{ weight: 1, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }) },
	{ weight: 1, arbitrary: fc.array(hostileText, { maxLength: 3 }) },
	{ weight: 1, arbitrary: fc.dictionary(hostileText, hostileText, { maxKeys: 3 }) }
);

/** JSON text of a value, with RAW markers written as bare literals. */
export function toJsonText(value: unknown): string {
	return JSON.stringify(value).replace(/"\\u0001raw:([^"]*)"/g, '$1');
}

/** Keys a client might add to get more than it should, or to confuse a parser. */
const EXTRA_KEYS = [
	'__proto__',
	'constructor',
	'isAdmin',
	'role',
	'id',
	'organizationId',
	'exporterId',
	'createdBy',
	'status',
	'version',
	'zz_unknown_field'
];

type Path = (string | number)[];

/** Every path into a value (objects and arrays, a few levels deep), the root excluded. */
export function pathsOf(value: unknown, depth = 5, prefix: Path = []): Path[] {
	if (depth === 0 || value === null || typeof value !== 'object') return [];
	const entries = Array.isArray(value)
		? value.slice(0, 3).map((v, i) => [i, v] as const)
		: Object.entries(value);
	return entries.flatMap(([key, child]) => [
		[...prefix, key],
		...pathsOf(child, depth - 1, [...prefix, key])
	]);
}

function setPath(target: unknown, path: Path, value: unknown, remove = false): void {
	let node = target as Record<string | number, unknown>;
	for (const key of path.slice(0, -1)) {
		const next = node[key];
		if (next === null || typeof next !== 'object') return;
		node = next as Record<string | number, unknown>;
	}
	const last = path[path.length - 1]!;
	if (remove) {
		if (Array.isArray(node) && typeof last === 'number') node.splice(last, 1);
		else delete node[last];
	} else {
		Object.defineProperty(node, last, {
			value,
			enumerable: true,
			writable: true,
			configurable: true
		});
	}
}

export interface JsonMutation {
	changes: [number, unknown][];
	drops: number[];
	extra: [string, unknown] | null;
}

/** Mutations of a JSON body: one to four values replaced, maybe fields dropped or one added. */
export const jsonMutation: fc.Arbitrary<JsonMutation> = fc.record({
	changes: fc.array(fc.tuple(fc.nat(), hostileJson), { minLength: 1, maxLength: 4 }),
	drops: fc.array(fc.nat(), { maxLength: 2 }),
	extra: fc.option(fc.tuple(fc.constantFrom(...EXTRA_KEYS), hostileJson), { freq: 3 })
});

/** The base value with the mutation applied (the base itself is left alone). */
export function applyJsonMutation(base: unknown, mutation: JsonMutation): unknown {
	const copy = structuredClone(base) as Record<string, unknown>;
	const paths = pathsOf(base);
	if (paths.length === 0 || copy === null || typeof copy !== 'object') {
		return mutation.changes[0]![1];
	}
	for (const [n, value] of mutation.changes) setPath(copy, paths[n % paths.length]!, value);
	for (const n of mutation.drops) setPath(copy, paths[n % paths.length]!, undefined, true);
	if (mutation.extra) setPath(copy, [mutation.extra[0]], mutation.extra[1]);
	return copy;
}

/** Bodies that are not the JSON object an API expects. */
export const MALFORMED_JSON = [
	'',
	'{',
	'{"a":',
	'[1,2',
	'null',
	'"just a string"',
	'12',
	'[]',
	'[{}]',
	'{"a":1}{"b":2}',
	"{'single': 'quotes'}",
	'{"a":NaN}',
	'{"a":Infinity}',
	'\u0000',
	'\uFEFF{}',
	'['.repeat(10_000) + ']'.repeat(10_000),
	'{"a":'.repeat(3_000) + '1' + '}'.repeat(3_000)
];

/** Content types an API that reads JSON should refuse or survive. */
export const WRONG_CONTENT_TYPES = [
	'text/plain',
	'application/x-www-form-urlencoded',
	'multipart/form-data; boundary=nothing',
	'application/xml',
	'application/json; charset=latin1',
	''
];
