/**
 * Why a piece fits no candidate container at all, worded for the coordinator: the largest door
 * height, inside or payload quoted so the figure can be checked against the piece.
 */
import { insideExtents, usableExtents, type PreparedContainer, type PreparedItem } from './prepare';

type Cause = 'inside' | 'doorHeight' | 'doorWidth' | 'payload';

function causeIn(item: PreparedItem, c: PreparedContainer): Cause | null {
	const inside = insideExtents(item, c);
	if (inside.length === 0) return 'inside';
	if (usableExtents(item, c).length === 0) {
		const d = c.source;
		return inside.every((e) => e.dz > d.doorHeightMm) ? 'doorHeight' : 'doorWidth';
	}
	if (item.weight > c.payload) return 'payload';
	return null;
}

function maxOf(cs: readonly PreparedContainer[], f: (c: PreparedContainer) => number): number {
	return Math.max(...cs.map(f));
}

/** The reason `item` fits none of `containers`, or null when at least one can take it. */
export function unplaceableReason(
	item: PreparedItem,
	containers: readonly PreparedContainer[]
): string | null {
	const causes = containers.map((c) => causeIn(item, c));
	if (causes.some((c) => c === null)) return null;
	const all = (k: Cause) => causes.every((c) => c === k);
	const rule =
		item.source.orientations === 'thisWayUp'
			? 'standing this way up'
			: 'in its allowed orientations';
	if (all('doorHeight')) {
		const h = maxOf(containers, (c) => c.source.doorHeightMm);
		return `taller than the door opening of every candidate container (${h} mm) ${rule}`;
	}
	if (all('doorWidth') || causes.every((c) => c === 'doorHeight' || c === 'doorWidth')) {
		return `does not pass the door opening of any candidate container ${rule}`;
	}
	if (all('inside')) {
		return `larger than the inside of every candidate container ${rule}`;
	}
	if (all('payload')) {
		const kg = containers.map((c) => c.source.maxPayloadKg).join(', ');
		return `heavier than the payload of every candidate container (${kg} kg)`;
	}
	const words: Record<Cause, string> = {
		inside: 'larger than the inside',
		doorHeight: 'taller than the door',
		doorWidth: 'wider than the door',
		payload: 'heavier than the payload'
	};
	return `fits no candidate container (${containers
		.map((c, i) => `${c.source.id}: ${words[causes[i]!]}`)
		.join('; ')})`;
}
