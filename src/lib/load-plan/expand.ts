/**
 * Placed blocks → boxes in container coordinates, in a feasible loading order: blocks in the
 * order placed (each after the block it rests on), inside a block bottom layer first, then from
 * the front wall towards the door.
 */
import type { Block } from './blocks';
import type { CoreBox, CoreProblem } from './core-types';
import type { PlacedBlock } from './search-state';

function expandBlock(
	problem: CoreProblem,
	b: Block,
	x: number,
	y: number,
	z: number,
	out: CoreBox[]
): void {
	if (b.kind === 0) {
		const extent = problem.types[b.t]!.extents[b.o]!;
		for (let iz = 0; iz < b.nz; iz++) {
			for (let ix = 0; ix < b.nx; ix++) {
				for (let iy = 0; iy < b.ny; iy++) {
					out.push({
						type: b.t,
						extent,
						x: x + ix * extent.dx,
						y: y + iy * extent.dy,
						z: z + iz * extent.dz
					});
				}
			}
		}
		return;
	}
	const a = b.a!;
	expandBlock(problem, a, x, y, z, out);
	if (b.kind === 1) expandBlock(problem, b.b!, x + a.dx, y, z, out);
	else if (b.kind === 2) expandBlock(problem, b.b!, x, y + a.dy, z, out);
	else expandBlock(problem, b.b!, x, y, z + a.dz, out);
}

export function expandPlaced(problem: CoreProblem, placed: readonly PlacedBlock[]): CoreBox[] {
	const out: CoreBox[] = [];
	for (const p of placed) expandBlock(problem, p.block, p.x, p.y, p.z, out);
	return out;
}
