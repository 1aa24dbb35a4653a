/**
 * Load-plan pictures on the page: the projection's polygons and lines (already in painter's
 * order) scaled into a box, its labels, and a legend of the products with their colours.
 */
import type { Drawing, Shape } from '../../../load-plan-view/project';
import { formatCount } from '../../../documents/format';
import { COLOUR, SIZE, plainText, strongText } from './layout';
import type { Doc } from './layout';

export interface LoadPlanPictureForPdf {
	label: string;
	drawing: Drawing;
	legend: { sku: string; colour: string; count: number }[];
}

const LINE_WIDTH: Record<Shape['weight'], number> = { edge: 0.25, frame: 0.7, highlight: 1.2 };

/** Draws `picture` inside the box (x, y, width, height), label on top and legend below. */
export function drawPicture(
	doc: Doc,
	picture: LoadPlanPictureForPdf,
	box: { x: number; y: number; width: number; height: number }
): void {
	strongText(doc, picture.label, box.x, box.y, { size: SIZE.body, lineBreak: false });
	const legendRows = Math.ceil(picture.legend.length / 3);
	const legendH = legendRows * 11;
	const top = box.y + 14 + 10; // room for labels set above the drawing
	const area = { x: box.x, y: top, width: box.width, height: box.height - 14 - 10 - 12 - legendH };
	const { minX, minY, maxX, maxY } = picture.drawing.bounds;
	const scale = Math.min(area.width / (maxX - minX || 1), area.height / (maxY - minY || 1));
	const offX = area.x + (area.width - (maxX - minX) * scale) / 2;
	// Top-aligned: a flat view is short, and its legend follows right under it.
	const offY = area.y;
	const at = (px: number, py: number): [number, number] => [
		offX + (px - minX) * scale,
		offY + (py - minY) * scale
	];
	doc.save();
	doc.lineJoin('round');
	for (const s of picture.drawing.shapes) {
		const points = s.points.map(([px, py]) => at(px, py));
		doc.lineWidth(LINE_WIDTH[s.weight]);
		if (s.kind === 'line') {
			doc.moveTo(...points[0]!);
			for (const p of points.slice(1)) doc.lineTo(...p);
			doc.strokeColor(s.stroke).stroke();
		} else {
			doc.polygon(...points);
			if (s.fill) doc.fillColor(s.fill).strokeColor(s.stroke).fillAndStroke();
			else doc.strokeColor(s.stroke).stroke();
		}
	}
	doc.restore();
	for (const l of picture.drawing.labels) {
		const [lx, ly] = at(l.x, l.y);
		// Centred on its point, but kept inside the box (end labels of a flat view sit on its corners).
		const x = Math.min(Math.max(lx - 40, box.x), box.x + box.width - 80);
		plainText(doc, l.text, x, l.above ? ly - 10 : ly + 2, {
			width: 80,
			align: 'center',
			size: SIZE.label,
			colour: COLOUR.muted,
			lineBreak: false
		});
	}
	// Right under the drawing, not at the foot of the box.
	const legendTop = offY + (maxY - minY) * scale + 14;
	const cellW = box.width / 3;
	picture.legend.forEach((item, i) => {
		const x = box.x + (i % 3) * cellW;
		const y = legendTop + Math.floor(i / 3) * 11;
		doc.save();
		doc
			.rect(x, y + 1, 8, 6)
			.fillColor(item.colour)
			.fill();
		doc.restore();
		plainText(doc, `${item.sku}: ${formatCount(item.count)} pieces`, x + 12, y, {
			size: SIZE.small,
			width: cellW - 14,
			lineBreak: false
		});
	});
}
