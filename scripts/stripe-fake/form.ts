// Stripe's request bodies: application/x-www-form-urlencoded with bracketed keys, e.g.
// `metadata[deposit_id]=…&line_items[0][price_data][currency]=eur`. Numeric keys become arrays.

export type FormValue = string | FormValue[] | { [key: string]: FormValue };
export type FormObject = { [key: string]: FormValue };

function insert(target: FormObject, path: string[], value: string): void {
	let node: FormObject = target;
	path.forEach((key, i) => {
		if (i === path.length - 1) {
			node[key] = value;
			return;
		}
		const existing = node[key];
		if (typeof existing !== 'object' || existing === null) node[key] = {};
		node = node[key] as FormObject;
	});
}

/** Objects whose keys are all 0, 1, 2… become arrays (Stripe's indexed array format). */
function arrays(value: FormValue): FormValue {
	if (typeof value === 'string' || Array.isArray(value)) return value;
	const keys = Object.keys(value);
	const converted: FormObject = {};
	for (const key of keys) converted[key] = arrays(value[key]!);
	if (keys.length > 0 && keys.every((k, i) => k === String(i)))
		return keys.map((k) => converted[k]!);
	return converted;
}

/** Parses a form body; `a[b][0]=x` → `{ a: { b: ['x'] } }`. */
export function parseStripeForm(body: string): FormObject {
	const root: FormObject = {};
	for (const [rawKey, value] of new URLSearchParams(body)) {
		const match = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(rawKey);
		if (!match) continue;
		const path = [match[1]!, ...[...match[2]!.matchAll(/\[([^[\]]*)\]/g)].map((m) => m[1]!)];
		insert(root, path, value);
	}
	return arrays(root) as FormObject;
}

/** A canonical string of parsed parameters, to compare the bodies of one idempotency key. */
export function fingerprint(value: FormValue): string {
	if (typeof value === 'string') return JSON.stringify(value);
	if (Array.isArray(value)) return `[${value.map(fingerprint).join(',')}]`;
	const keys = Object.keys(value).sort();
	return `{${keys.map((k) => `${JSON.stringify(k)}:${fingerprint(value[k]!)}`).join(',')}}`;
}
