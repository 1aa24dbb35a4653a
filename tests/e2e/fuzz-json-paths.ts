// Walking and changing a JSON body one leaf at a time, for the fuzz specs that start from a
// valid body (fuzz-calc, fuzz-webhooks).

export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };
export type Path = (string | number)[];

/** Every leaf path of a JSON value (arrays and objects are walked; empty ones count as leaves). */
export function leafPaths(value: Json, prefix: Path = []): Path[] {
	if (Array.isArray(value)) {
		if (value.length === 0) return [prefix];
		return value.flatMap((v, i) => leafPaths(v, [...prefix, i]));
	}
	if (value !== null && typeof value === 'object') {
		const keys = Object.keys(value);
		if (keys.length === 0) return [prefix];
		return keys.flatMap((k) => leafPaths(value[k]!, [...prefix, k]));
	}
	return [prefix];
}

/** A copy of `value` with the leaf at `path` set to `leaf`, or left out when `leaf` is undefined. */
export function setPath(value: Json, path: Path, leaf: Json | undefined): Json {
	const copy = structuredClone(value);
	let node = copy as Record<string | number, Json>;
	for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, Json>;
	const last = path[path.length - 1]!;
	if (leaf === undefined) {
		if (Array.isArray(node)) node.splice(Number(last), 1);
		else delete node[last];
	} else node[last] = leaf;
	return copy;
}
