/**
 * planLoad: the whole plan for a shipment. Pieces no candidate container can take are reported
 * first, with the reason; the rest go to container-mix.ts (which types, how many) and the
 * single-container search; the result is dressed with utilisation, payload, the centre of gravity
 * and its warnings.
 *
 * Pure module: no framework imports. Deterministic: the search is bounded by a count of work,
 * not by the clock (work-budget.ts), so the same input and seed give the same plan on any
 * machine, unless the wall-clock safety stop was hit (`search.stoppedBy === 'time'`).
 */
import Decimal from 'decimal.js';
import { centreOfGravity, centreOfGravityWarnings } from './centre-of-gravity';
import { chooseMix } from './container-mix';
import type { FillResult } from './fill-container';
import {
	prepareContainer,
	prepareItem,
	type PreparedContainer,
	type PreparedItem
} from './prepare';
import type {
	ContainerLoad,
	LoadPlan,
	LoadPlanInput,
	LoadPlanResult,
	Placement,
	UnplacedItems
} from './types';
import { frontGapWarning, stowShift, type Extent1 } from './stow-shift';
import { unplaceableReason } from './unplaceable';
import { validateLoadInput } from './validate-input';
import { SAFETY_FACTOR, SAFETY_SLACK_MS, WORK_PER_MS } from './work-budget';

export const DEFAULT_TIME_BUDGET_MS = 3_000;
export const DEFAULT_MAX_CONTAINERS = 100;
const M3 = new Decimal(1e9);

function share(part: Decimal, whole: Decimal): string {
	return whole.isZero() ? '0.0000' : part.dividedBy(whole).toFixed(4, Decimal.ROUND_HALF_UP);
}

function cargoCentre(c: PreparedContainer, items: readonly PreparedItem[], ps: Placement[]) {
	return centreOfGravity(
		ps.map((p, i) => ({
			weightKg: items[i]!.source.weightKg,
			cx: p.x + p.lengthMm / 2,
			cy: p.y + p.widthMm / 2,
			cz: p.z + p.heightMm / 2
		})),
		c.L,
		c.W
	);
}

function containerLoad(
	index: number,
	c: PreparedContainer,
	items: readonly PreparedItem[],
	fill: FillResult,
	balance: boolean
): ContainerLoad {
	let placements: Placement[] = fill.boxes.map((b) => ({
		itemTypeId: items[b.item]!.source.id,
		x: b.x,
		y: b.y,
		z: b.z,
		lengthMm: b.extent.dx,
		widthMm: b.extent.dy,
		heightMm: b.extent.dz,
		orientation: b.extent.orientation
	}));
	// Summed per item, then in decimals: the same totals with far fewer decimal operations.
	const perItem = new Map<number, { n: number; mm3: number }>();
	for (const b of fill.boxes) {
		const sum = perItem.get(b.item) ?? { n: 0, mm3: 0 };
		sum.n++;
		sum.mm3 += b.extent.dx * b.extent.dy * b.extent.dz; // whole mm³, exact below 2^53
		perItem.set(b.item, sum);
	}
	let volume = new Decimal(0);
	let kg = new Decimal(0);
	for (const [item, sum] of perItem) {
		volume = volume.plus(sum.mm3);
		kg = kg.plus(new Decimal(items[item]!.source.weightKg).times(sum.n));
	}
	const pieceItems = fill.boxes.map((b) => items[b.item]!);
	let cog = cargoCentre(c, pieceItems, placements);
	const shift = balance
		? stowShift(
				cog,
				c.L,
				c.W,
				span(placements.map((p) => [p.x, p.x + p.lengthMm])),
				span(placements.map((p) => [p.y, p.y + p.widthMm]))
			)
		: { xMm: 0, yMm: 0 };
	if (shift.xMm !== 0 || shift.yMm !== 0) {
		placements = placements.map((p) => ({ ...p, x: p.x + shift.xMm, y: p.y + shift.yMm }));
		cog = cargoCentre(c, pieceItems, placements);
	}
	const warnings = centreOfGravityWarnings(cog);
	if (shift.xMm > 0) warnings.push(frontGapWarning(shift.xMm));
	return {
		index,
		containerTypeId: c.source.id,
		placements,
		pieces: placements.length,
		loadedVolumeM3: volume.dividedBy(M3).toFixed(6, Decimal.ROUND_HALF_UP),
		volumeUtilisation: share(volume, new Decimal(c.volume)),
		payloadKg: kg.toFixed(3, Decimal.ROUND_HALF_UP),
		payloadUtilisation: share(kg, new Decimal(c.source.maxPayloadKg)),
		centreOfGravity: cog,
		warnings,
		shift
	};
}

/** Lowest and highest coordinate of some [from, to) ranges (0, 0 for none). */
function span(ranges: [number, number][]): Extent1 {
	if (ranges.length === 0) return { lo: 0, hi: 0 };
	return {
		lo: Math.min(...ranges.map((r) => r[0])),
		hi: Math.max(...ranges.map((r) => r[1]))
	};
}

export function planLoad(input: LoadPlanInput): LoadPlanResult {
	const problems = validateLoadInput(input);
	if (problems.length > 0) return { ok: false, problems };
	const start = performance.now();
	const options = input.options ?? {};
	const budget = options.timeBudgetMs ?? DEFAULT_TIME_BUDGET_MS;
	const work = options.workBudget ?? budget * WORK_PER_MS;
	const deadline = start + SAFETY_FACTOR * budget + SAFETY_SLACK_MS;
	const maxContainers = options.maxContainers ?? DEFAULT_MAX_CONTAINERS;
	const seed = options.seed ?? 1;
	const items = input.items.map(prepareItem);
	const containers = input.containers.map(prepareContainer);
	const rates =
		options.objective === 'cheapest'
			? containers.map((c) => new Decimal(options.rates![c.source.id]!))
			: null;

	const unplaced: UnplacedItems[] = [];
	const remaining = items.map((it) => it.source.count);
	items.forEach((it, i) => {
		const reason = unplaceableReason(it, containers);
		if (reason !== null) {
			unplaced.push({ itemTypeId: it.source.id, count: it.source.count, reason });
			remaining[i] = 0;
		}
	});
	const total = remaining.reduce((a, b) => a + b, 0);
	const mix = chooseMix(items, containers, remaining, {
		rates,
		maxContainers,
		work,
		deadline,
		seed,
		onSequence: (best) =>
			options.onProgress?.({
				containers: best.fills.length,
				placed: best.placed,
				total,
				elapsedMs: Math.round(performance.now() - start)
			})
	});
	const balance = (options.stowAt ?? 'balanced') === 'balanced';
	const loads = mix.fills.map((f, i) =>
		containerLoad(i + 1, containers[f.type]!, items, f.fill, balance)
	);
	const stoppedBy = mix.stoppedBy;
	const reason =
		maxContainers === 1
			? 'no space left in the container'
			: loads.length >= maxContainers
				? `no space left within the limit of ${maxContainers} containers`
				: 'no space left';
	items.forEach((it, i) => {
		if (mix.remaining[i]! > 0) {
			unplaced.push({ itemTypeId: it.source.id, count: mix.remaining[i]!, reason });
		}
	});

	const counts = containers
		.map((c, type) => ({
			containerTypeId: c.source.id,
			count: loads.filter((l) => l.containerTypeId === c.source.id).length,
			type
		}))
		.filter((x) => x.count > 0)
		.map(({ containerTypeId, count }) => ({ containerTypeId, count }));
	let totalCost: string | null = null;
	if (options.rates !== undefined) {
		const rateOf = options.rates;
		if (loads.every((l) => rateOf[l.containerTypeId] !== undefined)) {
			totalCost = loads
				.reduce((sum, l) => sum.plus(rateOf[l.containerTypeId]!), new Decimal(0))
				.toFixed();
		}
	}
	const plan: LoadPlan = {
		containers: loads,
		containerCounts: counts,
		totalCost,
		unplaced,
		search: {
			elapsedMs: Math.round(performance.now() - start),
			stoppedBy,
			timeBudgetMs: budget,
			workBudget: work,
			workUsed: Math.round(mix.work),
			seed
		}
	};
	return { ok: true, plan, problems: [] };
}
