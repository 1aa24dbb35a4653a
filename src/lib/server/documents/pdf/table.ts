/**
 * A table that runs over pages: each row is measured first, and a row that does not fit starts a
 * new page (running header again) and repeats the column titles there. Numeric columns are
 * right-aligned; text cells wrap within their column, with an optional smaller note below.
 */
import { COLOUR, CONTENT_BOTTOM, MARGIN, SIZE, plainText, strongText, textHeight } from './layout';
import type { Doc, PageFrame } from './layout';

export interface Column {
	title: string;
	width: number;
	align?: 'left' | 'right';
}

/** A cell: its text, and a smaller muted note under it (SKU, lots, "each 12.500"). */
export type Cell = string | { text: string; note?: string | null };

const PAD_X = 3;
const PAD_Y = 2.6;
const NOTE_SIZE = 6.4;

function parts(cell: Cell): { text: string; note: string | null } {
	return typeof cell === 'string'
		? { text: cell, note: null }
		: { text: cell.text, note: cell.note ?? null };
}

function cellHeight(doc: Doc, cell: Cell, width: number, size: number): number {
	const { text, note } = parts(cell);
	const inner = width - 2 * PAD_X;
	let h = text ? textHeight(doc, text, inner, size) : 0;
	if (note) h += textHeight(doc, note, inner, NOTE_SIZE) + 0.8;
	return h;
}

function titlesHeight(doc: Doc, columns: readonly Column[]): number {
	const h = Math.max(
		...columns.map((c) => textHeight(doc, c.title, c.width - 2 * PAD_X, SIZE.label))
	);
	return h + 2 * PAD_Y + 1;
}

function drawTitles(doc: Doc, frame: PageFrame, columns: readonly Column[]): void {
	const h = titlesHeight(doc, columns);
	let x = MARGIN.left;
	const y = frame.y;
	for (const c of columns) {
		strongText(doc, c.title, x + PAD_X, y + PAD_Y, {
			width: c.width - 2 * PAD_X,
			align: c.align ?? 'left',
			size: SIZE.label,
			colour: COLOUR.accent
		});
		x += c.width;
	}
	hline(doc, y + h, columns, COLOUR.accent, 0.6);
	frame.y = y + h;
}

function hline(doc: Doc, y: number, columns: readonly Column[], colour: string, width: number) {
	const total = columns.reduce((s, c) => s + c.width, 0);
	doc.save();
	doc
		.moveTo(MARGIN.left, y)
		.lineTo(MARGIN.left + total, y)
		.lineWidth(width)
		.strokeColor(colour)
		.stroke();
	doc.restore();
}

function drawRow(
	doc: Doc,
	y: number,
	columns: readonly Column[],
	row: readonly Cell[],
	strong: boolean
): void {
	let x = MARGIN.left;
	columns.forEach((c, i) => {
		const { text, note } = parts(row[i] ?? '');
		const width = c.width - 2 * PAD_X;
		const align = c.align ?? 'left';
		const write = strong ? strongText : plainText;
		if (text) write(doc, text, x + PAD_X, y + PAD_Y, { width, align, size: SIZE.table });
		if (note) {
			const below = text ? textHeight(doc, text, width, SIZE.table) + 0.8 : 0;
			plainText(doc, note, x + PAD_X, y + PAD_Y + below, {
				width,
				align,
				size: NOTE_SIZE,
				colour: COLOUR.muted
			});
		}
		x += c.width;
	});
}

export interface TableOptions {
	/** A last row set heavier under a rule: the totals. */
	footer?: readonly Cell[];
}

/**
 * Writes `rows` from frame.y on; every page the table reaches gets the column titles again.
 * The column widths should add up to the content width.
 */
export function writeTable(
	frame: PageFrame,
	columns: readonly Column[],
	rows: readonly (readonly Cell[])[],
	options: TableOptions = {}
): void {
	const doc = frame.doc;
	const heights = (row: readonly Cell[]) =>
		Math.max(
			SIZE.table,
			...columns.map((c, i) => cellHeight(doc, row[i] ?? '', c.width, SIZE.table))
		) +
		2 * PAD_Y;
	// The titles and at least the first row together.
	const first = rows[0] ?? options.footer ?? [];
	frame.ensure(titlesHeight(doc, columns) + heights(first));
	drawTitles(doc, frame, columns);
	const all = options.footer ? [...rows, options.footer] : rows;
	all.forEach((row, k) => {
		const isFooter = options.footer !== undefined && k === rows.length;
		const h = heights(row);
		if (frame.y + h > CONTENT_BOTTOM) {
			frame.newPage();
			drawTitles(doc, frame, columns);
		}
		if (isFooter) hline(doc, frame.y, columns, COLOUR.ink, 0.6);
		drawRow(doc, frame.y, columns, row, isFooter);
		frame.y += h;
		if (!isFooter) hline(doc, frame.y, columns, COLOUR.rule, 0.3);
	});
}
