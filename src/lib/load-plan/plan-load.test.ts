import { describe, expect, it } from 'vitest';
import { planLoad } from './plan-load';
import { GP20, GP40, box, carton, input } from './test-fixtures';
import type { LoadPlan, LoadPlanInput } from './types';
import { validatePlan } from './validate-plan';

function plan(inp: LoadPlanInput): LoadPlan {
	const r = planLoad(inp);
	if (!r.ok) throw new Error(JSON.stringify(r.problems));
	expect(validatePlan(inp, r.plan)).toEqual([]);
	return r.plan;
}

describe('planLoad, known cases', () => {
	it('fills a container exactly with cartons that tile it (100 %)', () => {
		// 5 × 2 × 4 cartons of 200 × 300 × 100 tile 1000 × 600 × 400 exactly.
		const p = plan(input([carton('a', 200, 300, 100, 40)], [box('c', 1000, 600, 400)]));
		expect(p.unplaced).toEqual([]);
		expect(p.containers).toHaveLength(1);
		expect(p.containers[0]!.volumeUtilisation).toBe('1.0000');
	});

	it('refuses a carton taller than the door, with the reason', () => {
		const tall = { ...carton('tall', 500, 500, 2300, 2), orientations: 'thisWayUp' as const };
		const p = plan(input([tall, carton('ok', 500, 500, 500, 4)], [GP20]));
		expect(p.unplaced).toEqual([
			{
				itemTypeId: 'tall',
				count: 2,
				reason:
					'taller than the door opening of every candidate container (2280 mm) standing this way up'
			}
		]);
		expect(p.containers[0]!.pieces).toBe(4);
	});

	it('lays a tall carton on its side when its rule allows, to pass the door', () => {
		const p = plan(input([carton('tall', 500, 500, 2300, 2)], [GP20]));
		expect(p.unplaced).toEqual([]);
		expect(p.containers[0]!.placements.every((q) => q.heightMm <= 2280)).toBe(true);
	});

	it('never lays a this-way-up carton on its side', () => {
		const up = { ...carton('up', 400, 300, 250, 60), orientations: 'thisWayUp' as const };
		const p = plan(input([up, carton('free', 350, 250, 200, 60)], [box('c', 1300, 900, 800)]));
		const ups = p.containers.flatMap((c) => c.placements).filter((q) => q.itemTypeId === 'up');
		expect(ups.length).toBeGreaterThan(0);
		expect(ups.every((q) => q.heightMm === 250 && q.orientation.endsWith('H'))).toBe(true);
	});

	it('puts nothing on a piece that is not stackable', () => {
		const pallet = { ...carton('pal', 600, 400, 300, 6), stackable: false };
		const small = carton('small', 200, 200, 100, 40);
		const p = plan(input([pallet, small], [box('c', 1200, 800, 700)]));
		const ps = p.containers.flatMap((c) => c.placements);
		for (const q of ps.filter((x) => x.itemTypeId === 'pal')) {
			const top = q.z + q.heightMm;
			const onTop = ps.filter(
				(r) =>
					r.z === top &&
					r.x < q.x + q.lengthMm &&
					q.x < r.x + r.lengthMm &&
					r.y < q.y + q.widthMm &&
					q.y < r.y + r.widthMm
			);
			expect(onTop).toEqual([]);
		}
	});

	it('keeps the load on top within maxLoadOnTopKg (two high at most)', () => {
		const c = {
			...carton('c', 500, 500, 100, 20),
			orientations: 'thisWayUp' as const,
			maxLoadOnTopKg: '10'
		};
		const p = plan(input([c], [box('b', 1000, 1000, 1000)], { maxContainers: 1 }));
		// 4 columns × 2 high: a third layer would put 20 kg on the bottom carton.
		expect(p.containers[0]!.pieces).toBe(8);
		expect(p.unplaced).toEqual([
			{ itemTypeId: 'c', count: 12, reason: 'no space left in the container' }
		]);
	});

	it('keeps the payload', () => {
		const heavy = { ...carton('h', 500, 500, 500, 30), weightKg: '1000' };
		const p = plan(input([heavy], [GP20], { maxContainers: 1 }));
		expect(p.containers[0]!.pieces).toBe(28); // 28,200 kg payload
		expect(p.containers[0]!.payloadKg).toBe('28000.000');
		expect(p.unplaced[0]!.count).toBe(2);
	});

	it('refuses a piece heavier than every payload', () => {
		const p = plan(input([{ ...carton('x', 100, 100, 100, 1), weightKg: '30000' }], [GP20, GP40]));
		expect(p.unplaced[0]!.reason).toBe(
			'heavier than the payload of every candidate container (28200, 26700 kg)'
		);
		expect(p.containers).toEqual([]);
	});

	it('chooses the fewest containers: one 40 ft rather than two 20 ft', () => {
		// 36 m³ of cartons: more than a 20 ft holds (33.2 m³), well within a 40 ft.
		const p = plan(input([carton('a', 600, 500, 400, 300)], [GP20, GP40], { timeBudgetMs: 2000 }));
		expect(p.containerCounts).toEqual([{ containerTypeId: '40GP', count: 1 }]);
	});

	it('chooses the cheapest with a rate card: two 20 ft when they cost less than a 40 ft', () => {
		const p = plan(
			input([carton('a', 600, 500, 400, 300)], [GP20, GP40], {
				timeBudgetMs: 2000,
				objective: 'cheapest',
				rates: { '20GP': '900', '40GP': '2500' }
			})
		);
		expect(p.containerCounts).toEqual([{ containerTypeId: '20GP', count: 2 }]);
		expect(p.totalCost).toBe('1800');
	});

	it('reports utilisation, payload and the centre of gravity', () => {
		const p = plan(input([carton('a', 200, 300, 100, 40)], [box('c', 1000, 600, 400, '800')]));
		const c = p.containers[0]!;
		expect(c.payloadKg).toBe('400.000');
		expect(c.payloadUtilisation).toBe('0.5000');
		expect(c.loadedVolumeM3).toBe('0.240000');
		expect(c.centreOfGravity).toMatchObject({ xMm: 500, yMm: 300, zMm: 200 });
		expect(c.warnings).toEqual([]);
	});

	it('gives the same plan for the same input and seed', () => {
		const inp = input(
			[
				carton('a', 310, 270, 190, 30),
				carton('b', 450, 220, 160, 25),
				carton('c', 180, 180, 180, 40)
			],
			[box('c', 1500, 1000, 900)],
			{ timeBudgetMs: 5000 }
		);
		const a = plan(inp);
		const b = plan(inp);
		expect(a.search.stoppedBy).toBe('complete');
		expect(b.containers).toEqual(a.containers);
	});

	it('returns field problems for bad input instead of throwing', () => {
		const bad = {
			items: [{ ...carton('a', 0, 300, 100, 1), weightKg: '-1' }],
			containers: [],
			options: { supportShare: 1.5, objective: 'cheapest' }
		} as unknown as LoadPlanInput;
		const r = planLoad(bad);
		expect(r.ok).toBe(false);
		expect(r.problems.map((p) => p.path)).toEqual([
			'items.0.lengthMm',
			'items.0.weightKg',
			'containers',
			'options.supportShare'
		]);
	});

	it('asks for a rate per container type for the cheapest plan', () => {
		const r = planLoad(
			input([carton('a', 1, 1, 1, 1)], [GP20], { objective: 'cheapest', rates: {} })
		);
		expect(r.problems).toEqual([
			{
				path: 'options.rates.20GP',
				message: 'Enter a rate for every candidate container type to choose the cheapest.'
			}
		]);
	});

	it('reports progress per container', () => {
		const seen: string[] = [];
		plan({
			...input(
				[carton('a', 500, 500, 500, 20)],
				[box('c', 1000, 1000, 1000), box('d', 1000, 1000, 500)]
			),
			options: {
				timeBudgetMs: 500,
				onProgress: (p) => seen.push(`${p.containers}:${p.placed}/${p.total}`)
			}
		});
		// One call per candidate type tried; the last is the plan: two full boxes, then a half box.
		expect(seen.at(-1)).toBe('3:20/20');
	});
});
