/**
 * The page of Landfall's papers: A4 portrait, the font the app ships, colours, the running
 * header every page repeats, and "Page x of y" written at the end (pages are buffered).
 *
 * Output is deterministic: dates come from the snapshot and the file ID is pdfkit's hash of the
 * info dictionary, which carries the snapshot's own SHA-256, so one snapshot gives one byte string.
 */
import { createHash } from 'node:crypto';
import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import { pageLabel } from '../../../documents/format';

export type Doc = PDFKit.PDFDocument;

export const PAGE = { width: 595.28, height: 841.89 } as const;
export const MARGIN = { top: 36, bottom: 54, left: 40, right: 40 } as const;
export const CONTENT_WIDTH = PAGE.width - MARGIN.left - MARGIN.right;
/** Lowest y that content may reach; the footer sits below it. */
export const CONTENT_BOTTOM = PAGE.height - MARGIN.bottom;

export const COLOUR = {
	ink: '#161c1b',
	muted: '#5e6866',
	rule: '#b9c0bd',
	/** Landfall's own deep green ("kelp" in the app's palette). */
	accent: '#1b5139'
} as const;

export const FONT = 'landfall-text';
export const SIZE = { title: 16, body: 8.5, small: 7, label: 6.5, table: 7.8 } as const;

let fontPath: string | null = null;

/** Resolved through the package, so the adapter-node build finds it in node_modules too. */
export function textFontPath(): string {
	fontPath ??= createRequire(import.meta.url).resolve(
		'@expo-google-fonts/roboto-flex/400Regular/RobotoFlex_400Regular.ttf'
	);
	return fontPath;
}

export interface DocumentMeta {
	title: string;
	subject: string;
	/** YYYY-MM-DD: creation and modification date of the file. */
	issuedOn: string;
	/** Anything JSON: hashed into the info dictionary and so into the file ID. */
	snapshot: unknown;
}

export function createDocument(meta: DocumentMeta): Doc {
	const date = new Date(`${meta.issuedOn}T00:00:00Z`);
	if (Number.isNaN(date.getTime())) throw new RangeError(`Bad issue date '${meta.issuedOn}'`);
	const fingerprint = createHash('sha256').update(JSON.stringify(meta.snapshot)).digest('hex');
	const info: PDFKit.DocumentInfo & Record<string, unknown> = {
		Title: meta.title,
		Subject: meta.subject,
		Author: 'Landfall',
		Creator: 'Landfall',
		Producer: 'Landfall (pdfkit)',
		CreationDate: date,
		ModDate: date,
		// A custom Info key (ISO 32000-1, 14.3.3 allows them): the snapshot this file was made from.
		LandfallSnapshotSha256: fingerprint
	};
	const doc = new PDFDocument({
		size: 'A4',
		margins: { ...MARGIN },
		bufferPages: true,
		autoFirstPage: false,
		font: textFontPath(),
		info,
		lang: 'en',
		displayTitle: true
	});
	doc.registerFont(FONT, textFontPath());
	doc.font(FONT);
	return doc;
}

export type TextStyle = PDFKit.Mixins.TextOptions & { colour?: string; size?: number };

/**
 * Text at (x, y). `strong` sets it heavier by stroking its outline as well as filling it: the
 * font the app ships has no bold cut.
 */
function writeText(
	doc: Doc,
	text: string,
	x: number,
	y: number,
	style: TextStyle,
	strong: boolean
) {
	const { colour = COLOUR.ink, size = SIZE.body, ...rest } = style;
	doc.save();
	doc
		.fontSize(size)
		.fillColor(colour)
		.strokeColor(colour)
		.lineWidth(size / 40);
	doc.text(text, x, y, strong ? { ...rest, fill: true, stroke: true } : rest);
	doc.restore();
}

export function strongText(doc: Doc, text: string, x: number, y: number, style: TextStyle = {}) {
	writeText(doc, text, x, y, style, true);
}

export function plainText(doc: Doc, text: string, x: number, y: number, style: TextStyle = {}) {
	writeText(doc, text, x, y, style, false);
}

export function textHeight(doc: Doc, text: string, width: number, size: number): number {
	doc.fontSize(size);
	return doc.heightOfString(text, { width });
}

export function rule(doc: Doc, y: number, colour: string = COLOUR.rule, width = 0.4): void {
	doc.save();
	doc
		.moveTo(MARGIN.left, y)
		.lineTo(PAGE.width - MARGIN.right, y)
		.lineWidth(width)
		.strokeColor(colour)
		.stroke();
	doc.restore();
}

/**
 * Pages with a running header: `newPage()` starts a page and draws the header, `ensure(h)`
 * starts one when fewer than h points are left. Content writers keep `y` up to date.
 */
export class PageFrame {
	y: number = MARGIN.top;
	pages = 0;
	constructor(
		readonly doc: Doc,
		private readonly header: (doc: Doc, page: number) => number
	) {}

	newPage(): void {
		this.doc.addPage();
		this.pages += 1;
		this.y = this.header(this.doc, this.pages);
	}

	/** Returns true when it had to start a page. */
	ensure(height: number): boolean {
		if (this.pages > 0 && this.y + height <= CONTENT_BOTTOM) return false;
		this.newPage();
		return true;
	}

	gap(points: number): void {
		this.y += points;
	}
}

/**
 * Writes the footer of every page (a thin rule, "prepared with Landfall", the document's name and
 * "Page x of y") and returns the finished file.
 */
export async function finish(doc: Doc, name: string): Promise<{ pdf: Buffer; pages: number }> {
	const chunks: Buffer[] = [];
	doc.on('data', (chunk: Buffer) => chunks.push(chunk));
	const done = new Promise<void>((resolve, reject) => {
		doc.on('end', () => resolve());
		doc.on('error', reject);
	});
	const range = doc.bufferedPageRange();
	const y = PAGE.height - MARGIN.bottom + 16;
	const third = CONTENT_WIDTH / 3;
	for (let i = range.start; i < range.start + range.count; i++) {
		doc.switchToPage(i);
		// Below the bottom margin pdfkit would start a new page for the text: lift the margin.
		doc.page.margins.bottom = 0;
		rule(doc, y - 5);
		doc.fontSize(SIZE.small).fillColor(COLOUR.muted);
		doc.text('Prepared with ', MARGIN.left, y, { continued: true, lineBreak: false });
		doc.fillColor(COLOUR.accent).text('Landfall', { lineBreak: false });
		plainText(doc, name, MARGIN.left + third, y, {
			width: third,
			align: 'center',
			lineBreak: false,
			colour: COLOUR.muted,
			size: SIZE.small
		});
		plainText(doc, pageLabel(i - range.start + 1, range.count), MARGIN.left + 2 * third, y, {
			width: third,
			align: 'right',
			lineBreak: false,
			size: SIZE.small
		});
		doc.page.margins.bottom = MARGIN.bottom;
	}
	doc.end();
	await done;
	return { pdf: Buffer.concat(chunks), pages: range.count };
}
