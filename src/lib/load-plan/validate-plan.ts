/**
 * validatePlan: checks a plan against its input, independently of the search (it shares only the
 * orientation table). Used by the tests and the benchmark; an API caller may use it on a plan it
 * stored.
 *
 * Rules:
 * - every placement names an item type, has the extents of an allowed orientation, lies inside
 *   the container, and passes the door in its placed orientation (width ≤ door width, height ≤
 *   door height);
 * - no two pieces overlap (touching faces is fine);
 * - support: a piece above the floor rests on tops of pieces at exactly its bottom height over at
 *   least `supportShare` of its base area;
 * - stacking: the load on a piece is the full mass of every piece that rests on it, of every piece
 *   resting on those, and so on up (a conservative reading: mass is not split between several
 *   pieces underneath). It must not exceed maxLoadOnTopKg; a piece that is not stackable carries
 *   nothing at all;
 * - payload: the cargo mass (decimal sum) is within the container's maximum payload;
 * - counts: for every item type, pieces placed plus pieces reported unplaced equal its count.
 */
import Decimal from 'decimal.js';
import { allowsVertical, extentOf, verticalOf } from './orientations';
import { kgToMg } from './prepare';
import type { LoadItemType, LoadPlan, LoadPlanInput, Placement } from './types';

export interface Violation {
	/** 1-based container index, or 0 for the plan as a whole. */
	container: number;
	/** 0-based placement index within the container, or -1. */
	placement: number;
	rule:
		| 'item'
		| 'orientation'
		| 'bounds'
		| 'door'
		| 'overlap'
		| 'support'
		| 'stacking'
		| 'payload'
		| 'count';
	message: string;
}

function overlapLen(a1: number, a2: number, b1: number, b2: number): number {
	return Math.max(0, Math.min(a2, b2) - Math.max(a1, b1));
}

function checkOverlaps(ps: readonly Placement[], container: number, out: Violation[]): void {
	const order = ps.map((_, i) => i).sort((i, j) => ps[i]!.x - ps[j]!.x);
	for (let a = 0; a < order.length; a++) {
		const p = ps[order[a]!]!;
		for (let b = a + 1; b < order.length; b++) {
			const q = ps[order[b]!]!;
			if (q.x >= p.x + p.lengthMm) break;
			if (
				overlapLen(p.y, p.y + p.widthMm, q.y, q.y + q.widthMm) > 0 &&
				overlapLen(p.z, p.z + p.heightMm, q.z, q.z + q.heightMm) > 0
			) {
				out.push({
					container,
					placement: order[b]!,
					rule: 'overlap',
					message: `Placements ${order[a]} and ${order[b]} overlap.`
				});
			}
		}
	}
}

/** For each piece, the pieces resting directly on it (touching top to bottom, positive area). */
function restingOn(ps: readonly Placement[]): number[][] {
	const byTop = new Map<number, number[]>();
	ps.forEach((p, i) => {
		const top = p.z + p.heightMm;
		const list = byTop.get(top);
		if (list) list.push(i);
		else byTop.set(top, [i]);
	});
	const above: number[][] = ps.map(() => []);
	ps.forEach((q, j) => {
		for (const i of byTop.get(q.z) ?? []) {
			const p = ps[i]!;
			const ox = overlapLen(p.x, p.x + p.lengthMm, q.x, q.x + q.lengthMm);
			const oy = overlapLen(p.y, p.y + p.widthMm, q.y, q.y + q.widthMm);
			if (ox > 0 && oy > 0) above[i]!.push(j);
		}
	});
	return above;
}

function checkSupport(
	ps: readonly Placement[],
	share: number,
	container: number,
	out: Violation[]
): void {
	const byTop = new Map<number, number[]>();
	ps.forEach((p, i) => byTop.set(p.z + p.heightMm, [...(byTop.get(p.z + p.heightMm) ?? []), i]));
	const basisPoints = Math.round(share * 10_000);
	ps.forEach((q, j) => {
		if (q.z === 0) return;
		let area = 0;
		for (const i of byTop.get(q.z) ?? []) {
			const p = ps[i]!;
			area +=
				overlapLen(p.x, p.x + p.lengthMm, q.x, q.x + q.lengthMm) *
				overlapLen(p.y, p.y + p.widthMm, q.y, q.y + q.widthMm);
		}
		const base = q.lengthMm * q.widthMm;
		// Supporting tops at one height never overlap one another, so the areas add up exactly.
		if (area * 10_000 < basisPoints * base) {
			out.push({
				container,
				placement: j,
				rule: 'support',
				message: `Placement ${j} rests on ${((100 * area) / base).toFixed(1)} % of its base.`
			});
		}
	});
}

function checkStacking(
	ps: readonly Placement[],
	items: Map<string, LoadItemType>,
	container: number,
	out: Violation[]
): void {
	const above = restingOn(ps);
	const mg = ps.map((p) => kgToMg(items.get(p.itemTypeId)!.weightKg));
	const seen = new Int32Array(ps.length).fill(-1);
	ps.forEach((p, i) => {
		const item = items.get(p.itemTypeId)!;
		if (item.stackable === false) {
			if (above[i]!.length > 0) {
				out.push({
					container,
					placement: i,
					rule: 'stacking',
					message: `Placement ${i} (${item.id}) is not stackable but carries placement ${above[i]![0]}.`
				});
			}
			return;
		}
		if (item.maxLoadOnTopKg === undefined) return;
		let load = 0;
		const stack = [...above[i]!];
		while (stack.length > 0) {
			const j = stack.pop()!;
			if (seen[j] === i) continue;
			seen[j] = i;
			load += mg[j]!;
			stack.push(...above[j]!);
		}
		if (load > kgToMg(item.maxLoadOnTopKg)) {
			out.push({
				container,
				placement: i,
				rule: 'stacking',
				message: `Placement ${i} (${item.id}) carries ${load / 1e6} kg, more than its ${item.maxLoadOnTopKg} kg.`
			});
		}
	});
}

function checkPlacement(
	p: Placement,
	i: number,
	container: number,
	ctype: LoadPlanInput['containers'][number],
	item: LoadItemType,
	out: Violation[]
): void {
	const v = (rule: Violation['rule'], message: string) =>
		out.push({ container, placement: i, rule, message });
	const [dx, dy, dz] = extentOf(p.orientation, item.lengthMm, item.widthMm, item.heightMm);
	if (dx !== p.lengthMm || dy !== p.widthMm || dz !== p.heightMm) {
		v('orientation', `Placement ${i}: extents do not match orientation ${p.orientation}.`);
	}
	if (!allowsVertical(item.orientations, verticalOf(p.orientation))) {
		v('orientation', `Placement ${i}: ${item.id} may not stand as ${p.orientation}.`);
	}
	const ints = [p.x, p.y, p.z, p.lengthMm, p.widthMm, p.heightMm];
	if (
		!ints.every(Number.isSafeInteger) ||
		p.x < 0 ||
		p.y < 0 ||
		p.z < 0 ||
		p.x + p.lengthMm > ctype.lengthMm ||
		p.y + p.widthMm > ctype.widthMm ||
		p.z + p.heightMm > ctype.heightMm
	) {
		v('bounds', `Placement ${i} is not inside the container.`);
	}
	if (p.widthMm > ctype.doorWidthMm || p.heightMm > ctype.doorHeightMm) {
		v('door', `Placement ${i} does not pass the door opening as stowed.`);
	}
}

export function validatePlan(input: LoadPlanInput, plan: LoadPlan): Violation[] {
	const out: Violation[] = [];
	const items = new Map(input.items.map((it) => [it.id, it]));
	const ctypes = new Map(input.containers.map((c) => [c.id, c]));
	const share = input.options?.supportShare ?? 1;
	const placed = new Map<string, number>();
	plan.containers.forEach((load, ci) => {
		const container = ci + 1;
		const ctype = ctypes.get(load.containerTypeId);
		if (ctype === undefined) {
			out.push({ container, placement: -1, rule: 'item', message: 'Unknown container type.' });
			return;
		}
		const ps = load.placements;
		let known = true;
		let kg = new Decimal(0);
		ps.forEach((p, i) => {
			const item = items.get(p.itemTypeId);
			if (item === undefined) {
				out.push({
					container,
					placement: i,
					rule: 'item',
					message: `Unknown item type ${p.itemTypeId}.`
				});
				known = false;
				return;
			}
			placed.set(item.id, (placed.get(item.id) ?? 0) + 1);
			kg = kg.plus(item.weightKg);
			checkPlacement(p, i, container, ctype, item, out);
		});
		if (!known) return;
		checkOverlaps(ps, container, out);
		checkSupport(ps, share, container, out);
		checkStacking(ps, items, container, out);
		if (kg.greaterThan(ctype.maxPayloadKg)) {
			out.push({
				container,
				placement: -1,
				rule: 'payload',
				message: `Cargo of ${kg.toFixed()} kg exceeds the payload of ${ctype.maxPayloadKg} kg.`
			});
		}
	});
	const unplaced = new Map<string, number>();
	for (const u of plan.unplaced)
		unplaced.set(u.itemTypeId, (unplaced.get(u.itemTypeId) ?? 0) + u.count);
	for (const it of input.items) {
		const n = (placed.get(it.id) ?? 0) + (unplaced.get(it.id) ?? 0);
		if (n !== it.count) {
			out.push({
				container: 0,
				placement: -1,
				rule: 'count',
				message: `${it.id}: ${placed.get(it.id) ?? 0} placed + ${unplaced.get(it.id) ?? 0} unplaced ≠ ${it.count}.`
			});
		}
	}
	return out;
}
