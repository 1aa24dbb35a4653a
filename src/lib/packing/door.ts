/**
 * Will a carton go into a container at all? It must pass the door opening end-on (two of its
 * sides within the door's width and height) and its third side must fit the internal length.
 * A "this way up" carton keeps its height vertical, so only its height may meet the door height.
 *
 * Pure module: no framework imports.
 */
import type { Orientation } from './cartons';

export interface DoorBox {
	lengthMm: number;
	widthMm: number;
	heightMm: number;
	orientation: Orientation;
}

export interface DoorContainer {
	code: string;
	internalLengthMm: number;
	internalWidthMm: number;
	internalHeightMm: number;
	doorWidthMm: number;
	doorHeightMm: number;
}

/** [across, up, along] placements the carton may take: up is the vertical side. */
function placements(box: DoorBox): [number, number, number][] {
	const { lengthMm: l, widthMm: w, heightMm: h } = box;
	const upright: [number, number, number][] = [
		[w, h, l],
		[l, h, w]
	];
	if (box.orientation === 'this_way_up') return upright;
	return [...upright, [h, w, l], [l, w, h], [h, l, w], [w, l, h]];
}

/** Whether the carton can be loaded through this container's door in some allowed placement. */
export function passesDoor(box: DoorBox, container: DoorContainer): boolean {
	const across = Math.min(container.doorWidthMm, container.internalWidthMm);
	const up = Math.min(container.doorHeightMm, container.internalHeightMm);
	return placements(box).some(
		([a, u, along]) => a <= across && u <= up && along <= container.internalLengthMm
	);
}

/**
 * Null when some container takes the carton; else the message for the carton's size fields,
 * naming the largest door tried.
 */
export function doorProblem(box: DoorBox, containers: readonly DoorContainer[]): string | null {
	if (containers.length === 0 || containers.some((c) => passesDoor(box, c))) return null;
	const widest = containers.reduce((a, b) =>
		b.doorWidthMm * b.doorHeightMm > a.doorWidthMm * a.doorHeightMm ? b : a
	);
	const size = `${box.lengthMm} × ${box.widthMm} × ${box.heightMm} mm`;
	const upright = box.orientation === 'this_way_up' ? ', kept this way up,' : '';
	return (
		`A ${size} carton${upright} does not pass the door of any container type: the largest ` +
		`opening is ${widest.doorWidthMm} × ${widest.doorHeightMm} mm (${widest.code}). ` +
		`Split the goods into smaller cartons or ship them as out-of-gauge cargo.`
	);
}
