import { describe, expect, it } from 'vitest';
import { turnBox, visibleFaces, type Box } from './geometry';
import { colourMap, PRODUCT_COLOURS, shade } from './palette';
import { drawContainer, pathRuns, type PlacedBox } from './project';

const size = { lengthMm: 3000, widthMm: 2000, heightMm: 1000 };
const box = (x: number, y: number, z: number, colour = '#2b6cb0'): PlacedBox => ({
	x,
	y,
	z,
	dx: 1000,
	dy: 1000,
	dz: 1000,
	colour
});

describe('isometric projection', () => {
	// Isometric projection: axes 120° apart on the page, x and y at 30° below the horizontal and
	// z vertical, all at the same scale (Foley, van Dam et al., Computer Graphics: Principles and
	// Practice, 2nd ed., 1990, section 6.1.2, "isometric projection").
	it('puts the container corners where the isometric axes say', () => {
		const d = drawContainer(size, [], { kind: 'iso', turn: 0 });
		const floor = d.shapes[0]!.points;
		const c = Math.sqrt(3) / 2;
		expect(floor[0]).toEqual([0, 0]);
		expect(floor[1]![0]).toBeCloseTo(3000 * c);
		expect(floor[1]![1]).toBeCloseTo(1500); // 3000 × sin 30°
		expect(floor[3]![0]).toBeCloseTo(-2000 * c);
		expect(floor[3]![1]).toBeCloseTo(1000);
		// Height goes straight up the page at full scale.
		const post = d.shapes[1]!.points;
		expect(post[1]![1] - post[0]![1]).toBeCloseTo(-1000);
		expect(d.bounds.maxX - d.bounds.minX).toBeCloseTo(5000 * c);
	});

	it('draws the three faces a viewer above the door corner sees, shaded apart', () => {
		const d = drawContainer(size, [box(0, 0, 0)], { kind: 'iso', turn: 0 });
		const faces = d.shapes.filter((s) => s.item === 0);
		expect(faces.map((f) => f.fill)).toEqual([
			shade('#2b6cb0', 0.8),
			shade('#2b6cb0', 0.64),
			'#2b6cb0'
		]);
	});

	it('draws far boxes before near ones (painter’s order)', () => {
		const boxes = [box(1000, 1000, 0), box(0, 0, 0), box(2000, 0, 0)];
		const d = drawContainer(size, boxes, { kind: 'iso', turn: 0 });
		const first = (i: number) => d.shapes.findIndex((s) => s.item === i);
		// Box 1 at the far corner comes first; box 0 (nearer on x and y) after it.
		expect(first(1)).toBeLessThan(first(0));
		expect(first(1)).toBeLessThan(first(2));
	});

	it('turns the container about its vertical axis without moving it off its corner', () => {
		const b: Box = { x: 0, y: 0, z: 0, dx: 1000, dy: 500, dz: 100 };
		expect(turnBox(b, size, 1)).toEqual({ x: 1500, y: 0, z: 0, dx: 500, dy: 1000, dz: 100 });
		expect(turnBox(b, size, 2)).toEqual({ x: 2000, y: 1500, z: 0, dx: 1000, dy: 500, dz: 100 });
		expect(turnBox(b, size, 3)).toEqual({ x: 0, y: 2000, z: 0, dx: 500, dy: 1000, dz: 100 });
		// Four quarter turns are no turn.
		let t = b;
		let s = size;
		for (let k = 0; k < 4; k++) {
			t = turnBox(t, s, 1);
			s = { lengthMm: s.widthMm, widthMm: s.lengthMm, heightMm: s.heightMm };
		}
		expect(t).toEqual(b);
	});

	it('names the door and front wall where the turn put them', () => {
		const d0 = drawContainer(size, [], { kind: 'iso', turn: 0 });
		const d2 = drawContainer(size, [], { kind: 'iso', turn: 2 });
		const door = (d: typeof d0) => d.labels.find((l) => l.text === 'Door')!;
		const front = (d: typeof d0) => d.labels.find((l) => l.text === 'Front wall')!;
		expect(door(d0).x).toBeGreaterThan(front(d0).x);
		expect(door(d2).x).toBeLessThan(front(d2).x);
	});
});

describe('hidden faces', () => {
	it('leaves out faces covered whole by a neighbour', () => {
		const v = visibleFaces([box(0, 0, 0), box(1000, 0, 0), box(0, 0, 1000)]);
		expect(v[0]).toEqual({ px: false, py: true, pz: false, ny: true });
		expect(v[1]).toEqual({ px: true, py: true, pz: true, ny: true });
		expect(v[2]).toEqual({ px: true, py: true, pz: true, ny: true });
	});

	it('keeps a face only partly covered', () => {
		const small = { x: 1000, y: 0, z: 0, dx: 500, dy: 500, dz: 500 };
		expect(visibleFaces([box(0, 0, 0), small])[0]!.px).toBe(true);
	});

	it('draws a packed block of n³ cubes with about 3n² faces', () => {
		const n = 10;
		const boxes: PlacedBox[] = [];
		for (let x = 0; x < n; x++)
			for (let y = 0; y < n; y++)
				for (let z = 0; z < n; z++)
					boxes.push({
						x: x * 100,
						y: y * 100,
						z: z * 100,
						dx: 100,
						dy: 100,
						dz: 100,
						colour: '#2b6cb0'
					});
		const d = drawContainer({ lengthMm: 1000, widthMm: 1000, heightMm: 1000 }, boxes, {
			kind: 'iso',
			turn: 0
		});
		expect(d.shapes.filter((s) => s.item !== undefined)).toHaveLength(3 * n * n);
		// One product in one painter's run collapses into few paths.
		expect(pathRuns(d.shapes).length).toBeLessThan(3 * n * n);
	});
});

describe('side and top views (orthographic)', () => {
	it('shows length across and height up in the side view, door on the right', () => {
		const d = drawContainer(size, [box(2000, 0, 0)], { kind: 'side' });
		const item = d.shapes.find((s) => s.item === 0)!;
		expect(item.points).toEqual([
			[2000, 0],
			[3000, 0],
			[3000, 1000],
			[2000, 1000]
		]);
		expect(d.labels.find((l) => l.text === 'Door')!.x).toBe(3000);
	});

	it('shows only the top box of a stack in the top view and the left wall at the bottom', () => {
		const boxes = [box(0, 0, 0), box(0, 0, 1000), { ...box(0, 1000, 0), dz: 500 }];
		const d = drawContainer(size, boxes, { kind: 'top' });
		const items = d.shapes.filter((s) => s.item !== undefined);
		expect(items.map((s) => s.item).sort()).toEqual([1, 2]);
		// The stack at y = 0 (the left wall) is drawn at the bottom of the page (y 1000–2000).
		expect(items.find((s) => s.item === 1)!.points[2]).toEqual([1000, 2000]);
	});

	it('always outlines the highlighted box, even when hidden', () => {
		const d = drawContainer(size, [box(0, 0, 0), box(0, 0, 1000)], { kind: 'top' }, 0);
		expect(d.shapes.some((s) => s.item === 0 && s.weight === 'highlight')).toBe(true);
	});
});

describe('palette', () => {
	it('gives each product its own colour in first-seen order and repeats after ten', () => {
		const keys = Array.from({ length: 12 }, (_, i) => `SKU-${i}`);
		const m = colourMap(['SKU-0', ...keys]);
		expect(m.get('SKU-0')).toBe(PRODUCT_COLOURS[0]);
		expect(new Set([...m.values()]).size).toBe(10);
		expect(m.get('SKU-10')).toBe(PRODUCT_COLOURS[0]);
	});

	it('darkens a colour channel by channel', () => {
		expect(shade('#808080', 0.5)).toBe('#404040');
		expect(shade('#ffffff', 1)).toBe('#ffffff');
	});
});
