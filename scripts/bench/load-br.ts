// Parser of the Bischoff & Ratcliff / Davies & Bischoff container loading files (brN.txt): a
// stream of whitespace-separated integers, format as in the data folder's README.
import { readFileSync } from 'node:fs';
import type { LoadPlanInput } from '../../src/lib/load-plan';

export interface BrBoxType {
	dims: [number, number, number];
	/** flags[k]: dims[k] may stand vertical. */
	flags: [boolean, boolean, boolean];
	count: number;
}

export interface BrInstance {
	set: number;
	number: number;
	seed: number;
	container: [number, number, number];
	boxes: BrBoxType[];
}

export function parseBr(text: string, set: number): BrInstance[] {
	const tokens = text.trim().split(/\s+/).map(Number);
	let pos = 0;
	const next = (): number => {
		const v = tokens[pos++];
		if (v === undefined || !Number.isInteger(v)) throw new Error(`bad token at ${pos - 1}`);
		return v;
	};
	const problems = next();
	const out: BrInstance[] = [];
	for (let p = 0; p < problems; p++) {
		const number = next();
		const seed = next();
		const container: [number, number, number] = [next(), next(), next()];
		const n = next();
		const boxes: BrBoxType[] = [];
		for (let i = 0; i < n; i++) {
			next(); // type index
			const d1 = next();
			const f1 = next();
			const d2 = next();
			const f2 = next();
			const d3 = next();
			const f3 = next();
			boxes.push({ dims: [d1, d2, d3], flags: [f1 === 1, f2 === 1, f3 === 1], count: next() });
		}
		out.push({ set, number, seed, container, boxes });
	}
	if (pos !== tokens.length) throw new Error(`${tokens.length - pos} tokens left over`);
	return out;
}

export function readBrSet(dir: string, set: number): BrInstance[] {
	return parseBr(readFileSync(`${dir}/br${set}.txt`, 'utf8'), set);
}

/**
 * The planner input for one instance: one container with the door as large as its section (the
 * benchmark has no door), masses of 1 kg and no payload or stacking limit, full support.
 */
export function brInput(inst: BrInstance, timeBudgetMs: number): LoadPlanInput {
	const [L, W, H] = inst.container;
	return {
		items: inst.boxes.map((b, i) => ({
			id: `t${i + 1}`,
			label: `Box type ${i + 1}`,
			lengthMm: b.dims[0],
			widthMm: b.dims[1],
			heightMm: b.dims[2],
			weightKg: '1',
			count: b.count,
			orientations: { lengthUp: b.flags[0], widthUp: b.flags[1], heightUp: b.flags[2] }
		})),
		containers: [
			{
				id: 'br',
				lengthMm: L,
				widthMm: W,
				heightMm: H,
				doorWidthMm: W,
				doorHeightMm: H,
				maxPayloadKg: '1000000'
			}
		],
		options: { supportShare: 1, timeBudgetMs, maxContainers: 1, seed: 1 }
	};
}
