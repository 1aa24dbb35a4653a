/**
 * The packing list as a PDF, laid out from a frozen PackingListSnapshot: one row per run of
 * alike cartons, the totals, the load plan in figures and, on their own pages, its pictures.
 */
import { formatCount, formatDims, formatKg, formatM3 } from '../../../documents/format';
import type { PackingListSnapshot, PackingRow } from '../../../documents/types';
import {
	openPaper,
	paperName,
	sectionTitle,
	writeCautions,
	writeFacts,
	writeMarks
} from './blocks';
import { CONTENT_BOTTOM, CONTENT_WIDTH, MARGIN, PageFrame, finish, rule } from './layout';
import { drawPicture, type LoadPlanPictureForPdf } from './pictures';
import { writeTable, type Cell, type Column } from './table';

export type { LoadPlanPictureForPdf } from './pictures';

const COLUMNS: Column[] = [
	{ title: 'Carton nos.', width: 50 },
	{ title: 'Cartons', width: 32, align: 'right' },
	{ title: 'Contents', width: 112 },
	{ title: 'Units per carton', width: 32, align: 'right' },
	{ title: 'Units', width: 36, align: 'right' },
	{ title: 'Net kg', width: 48, align: 'right' },
	{ title: 'Gross kg', width: 48, align: 'right' },
	{ title: 'Carton L × W × H mm', width: 72, align: 'right' },
	{ title: 'Volume m³', width: 38, align: 'right' },
	{ title: 'Pallets', width: CONTENT_WIDTH - 468 }
];

function cartonRange(r: PackingRow): string {
	return r.fromCarton === r.toCarton ? String(r.fromCarton) : `${r.fromCarton}–${r.toCarton}`;
}

function row(r: PackingRow): Cell[] {
	return [
		cartonRange(r),
		formatCount(r.cartons),
		{ text: `${r.sku}  ${r.description}`, note: r.lots.length ? r.lots.join('\n') : null },
		formatCount(r.unitsPerCarton),
		formatCount(r.units),
		{ text: formatKg(r.netKg), note: `each ${formatKg(r.netKgPerCarton)}` },
		{ text: formatKg(r.grossKg), note: `each ${formatKg(r.grossKgPerCarton)}` },
		formatDims(r.lengthMm, r.widthMm, r.heightMm),
		formatM3(r.volumeM3),
		r.pallets ?? 'Loose'
	];
}

function totalsRow(s: PackingListSnapshot): Cell[] {
	const t = s.totals;
	return [
		'Total',
		formatCount(t.cartons),
		'',
		'',
		formatCount(t.units),
		formatKg(t.netKg),
		formatKg(t.grossKg),
		'',
		formatM3(t.volumeM3),
		t.pallets ? formatCount(t.pallets.count) : 'Loose'
	];
}

function packageFacts(s: PackingListSnapshot) {
	const t = s.totals;
	const facts = [
		{
			label: 'Packages',
			value: `${formatCount(t.cartons)} cartons, ${formatCount(t.units)} units`
		},
		{ label: 'Net weight', value: `${formatKg(t.netKg)} kg` },
		{ label: 'Gross weight of the cartons', value: `${formatKg(t.grossKg)} kg` }
	];
	if (t.pallets) {
		const p = t.pallets;
		facts.push(
			{ label: 'Pallets', value: `${formatCount(p.count)} × ${p.type}` },
			{ label: 'Pallet tare', value: `${formatKg(p.tareKg)} kg` },
			{ label: 'Gross weight with pallets', value: `${formatKg(p.grossKg)} kg` },
			{ label: 'Volume with pallets', value: `${formatM3(p.volumeM3)} m³` }
		);
	} else facts.push({ label: 'Pallets', value: 'None: the cartons travel loose' });
	return facts;
}

function writeLoadPlan(frame: PageFrame, s: PackingListSnapshot): void {
	const plan = s.loadPlan;
	if (!plan) return;
	sectionTitle(frame, 'Container load plan', 40);
	writeTable(
		frame,
		[
			{ title: 'Container', width: 150 },
			{ title: 'Type', width: 150 },
			{ title: 'Pieces', width: 60, align: 'right' },
			{ title: 'Volume used %', width: 70, align: 'right' },
			{ title: 'Payload kg', width: CONTENT_WIDTH - 430, align: 'right' }
		],
		plan.containers.map((c) => [
			c.label,
			c.type,
			formatCount(c.pieces),
			c.volumeUsedPercent,
			formatKg(c.payloadKg)
		])
	);
	frame.gap(4);
	if (plan.unplaced > 0) {
		writeFacts(frame, [
			{
				label: 'Not placed',
				value: `${formatCount(plan.unplaced)} pieces could not be placed by the plan: the pictures do not show the whole shipment.`,
				wide: true
			}
		]);
	}
	frame.gap(4);
}

function writePictures(frame: PageFrame, pictures: readonly LoadPlanPictureForPdf[]): void {
	for (let i = 0; i < pictures.length; i += 2) {
		frame.newPage();
		sectionTitle(frame, 'Load plan pictures', 0);
		const height = (CONTENT_BOTTOM - frame.y - 16) / 2;
		pictures.slice(i, i + 2).forEach((p, k) => {
			const y = frame.y + k * (height + 16);
			if (k > 0) rule(frame.doc, y - 8);
			drawPicture(frame.doc, p, { x: MARGIN.left, y, width: CONTENT_WIDTH, height });
		});
		frame.y = CONTENT_BOTTOM;
	}
}

export async function renderPackingListPdf(
	s: PackingListSnapshot,
	pictures: readonly LoadPlanPictureForPdf[] = []
): Promise<{ pdf: Buffer; pages: number }> {
	const frame = openPaper(s, { s, pictures }, 'Exporter / shipper');
	writeTable(frame, COLUMNS, s.rows.map(row), { footer: totalsRow(s) });
	frame.gap(8);
	writeFacts(frame, packageFacts(s), 4);
	writeLoadPlan(frame, s);
	writeMarks(frame, s.marks, `Cartons numbered 1–${s.totals.cartons}`);
	writeCautions(frame, s.cautions);
	writePictures(frame, pictures);
	return finish(frame.doc, paperName(s));
}
