// PostgreSQL text cannot hold U+0000: a NUL that reached a query would fail it (a 500). Parsed
// input is searched for it once, where forms and API bodies are validated, so every text field
// refuses it with a field error instead.

export const NUL_MESSAGE = 'Remove the NUL character (U+0000) from this text: it cannot be stored.';

/** The path of every string in a parsed value that holds U+0000. */
export function nulPaths(value: unknown, path: (string | number)[] = []): (string | number)[][] {
	if (typeof value === 'string') return value.includes('\u0000') ? [path] : [];
	if (value === null || typeof value !== 'object') return [];
	if (Array.isArray(value)) return value.flatMap((item, i) => nulPaths(item, [...path, i]));
	return Object.entries(value).flatMap(([key, item]) => nulPaths(item, [...path, key]));
}
