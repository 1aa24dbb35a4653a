/**
 * The commercial invoice as a PDF, laid out from a frozen InvoiceSnapshot. Every figure comes
 * from the snapshot as computed upstream; this module only formats and places it.
 */
import { formatAmount, formatCount, formatFixed, formatKg } from '../../../documents/format';
import type { InvoiceCharge, InvoiceLine, InvoiceSnapshot } from '../../../documents/types';
import {
	openPaper,
	paperName,
	sectionTitle,
	writeCautions,
	writeMarks,
	writeTextBlock
} from './blocks';
import {
	COLOUR,
	CONTENT_WIDTH,
	MARGIN,
	PageFrame,
	SIZE,
	finish,
	plainText,
	strongText,
	textHeight
} from './layout';
import { writeTable, type Cell, type Column } from './table';

/**
 * The agreed unit price as stored (up to 4 decimals): trailing zeros past the currency's minor
 * units dropped (18.4000 → 18.40), nothing rounded.
 */
function unitPrice(value: string, minorUnits: number): string {
	const fraction = (value.split('.')[1] ?? '').replace(/0+$/, '');
	const trimmed = value.includes('.') ? value.replace(/\.?0+$/, '') : value;
	return formatFixed(trimmed, Math.max(minorUnits, fraction.length), 'unit price');
}

function columns(currency: string): Column[] {
	return [
		{ title: 'No.', width: 22 },
		{ title: 'Description of goods', width: CONTENT_WIDTH - 338 },
		{ title: 'HS code', width: 66 },
		{ title: 'Origin', width: 30 },
		{ title: 'Quantity', width: 42, align: 'right' },
		{ title: 'Unit', width: 24 },
		{ title: `Unit price ${currency}`, width: 70, align: 'right' },
		{ title: `Amount ${currency}`, width: 84, align: 'right' }
	];
}

function lineRow(line: InvoiceLine, minorUnits: number): Cell[] {
	return [
		String(line.position),
		{ text: line.description, note: `SKU ${line.sku}` },
		line.hsCode,
		line.originCountry,
		formatCount(line.quantity),
		line.unit,
		unitPrice(line.unitPrice, minorUnits),
		formatAmount(line.amount, minorUnits)
	];
}

function chargeFigure(c: InvoiceCharge, minorUnits: number): string {
	return c.included && c.amount !== null ? formatAmount(c.amount, minorUnits) : 'Not included';
}

/** Weights and packages on the left, subtotal / freight / insurance / total on the right. */
function writeTotals(frame: PageFrame, s: InvoiceSnapshot): void {
	const doc = frame.doc;
	const rightX = MARGIN.left + CONTENT_WIDTH * 0.48;
	const rightW = CONTENT_WIDTH - (rightX - MARGIN.left);
	const amountW = 110;
	const labelW = rightW - amountW;
	const charges: [string, InvoiceCharge][] = [
		['Freight', s.freight],
		['Insurance', s.insurance]
	];
	const noteH = charges.reduce((h, [, c]) => h + textHeight(doc, c.note, labelW, SIZE.small), 0);
	frame.ensure(70 + noteH);
	const top = frame.y + 4;

	const left: [string, string][] = [
		['Total net weight', `${formatKg(s.netKg)} kg`],
		['Total gross weight', `${formatKg(s.grossKg)} kg`],
		['Number of packages', s.packages.text]
	];
	left.forEach(([label, value], i) => {
		const y = top + i * 20;
		plainText(doc, label, MARGIN.left, y, {
			size: SIZE.label,
			colour: COLOUR.muted,
			lineBreak: false
		});
		plainText(doc, value, MARGIN.left, y + 8, { width: rightX - MARGIN.left - 14 });
	});

	let y = top;
	const figure = (label: string, value: string, strong = false) => {
		const write = strong ? strongText : plainText;
		write(doc, label, rightX, y, { width: labelW, lineBreak: false });
		write(doc, value, rightX + labelW, y, { width: amountW, align: 'right', lineBreak: false });
		y += 12;
	};
	figure(`Subtotal of the lines (${s.currency})`, formatAmount(s.subtotal, s.minorUnits));
	for (const [label, c] of charges) {
		figure(label, chargeFigure(c, s.minorUnits));
		plainText(doc, c.note, rightX, y - 2, {
			width: labelW,
			size: SIZE.small,
			colour: COLOUR.muted
		});
		y += textHeight(doc, c.note, labelW, SIZE.small) + 1;
	}
	doc.save();
	doc
		.moveTo(rightX, y)
		.lineTo(rightX + rightW, y)
		.lineWidth(0.6)
		.strokeColor(COLOUR.ink)
		.stroke();
	doc.restore();
	y += 4;
	strongText(doc, `Total ${s.incoterm.code} (${s.currency})`, rightX, y, {
		width: labelW,
		size: SIZE.body + 1.5,
		lineBreak: false
	});
	strongText(doc, formatAmount(s.total, s.minorUnits), rightX + labelW, y, {
		width: amountW,
		align: 'right',
		size: SIZE.body + 1.5,
		lineBreak: false
	});
	y += 16;
	frame.y = Math.max(y, top + 3 * 20) + 6;
}

function writeDeclaration(frame: PageFrame, s: InvoiceSnapshot): void {
	const doc = frame.doc;
	const d = s.declaration;
	const textH = textHeight(doc, d.text, CONTENT_WIDTH, SIZE.body);
	sectionTitle(frame, 'Declaration', textH + 60);
	plainText(doc, d.text, MARGIN.left, frame.y, { width: CONTENT_WIDTH });
	frame.y += textH + 28;
	const w = CONTENT_WIDTH / 4;
	doc.save();
	doc
		.moveTo(MARGIN.left, frame.y)
		.lineTo(MARGIN.left + w - 8, frame.y)
		.lineWidth(0.5)
		.strokeColor(COLOUR.ink)
		.stroke();
	doc.restore();
	const cells: [string, string][] = [
		['Signature', ''],
		['Name', d.signatoryName],
		['Title', d.signatoryTitle],
		['Place and date', `${d.place}, ${d.date}`]
	];
	cells.forEach(([label, value], i) => {
		const x = MARGIN.left + i * w;
		plainText(doc, label, x, frame.y + 3, {
			size: SIZE.label,
			colour: COLOUR.muted,
			lineBreak: false
		});
		if (value) plainText(doc, value, x, frame.y + 11, { width: w - 8 });
	});
	frame.y += 34;
}

export async function renderInvoicePdf(
	s: InvoiceSnapshot
): Promise<{ pdf: Buffer; pages: number }> {
	const frame = openPaper(s, s, 'Exporter / seller', [
		{ label: 'Invoice currency', value: s.currency },
		{ label: 'Terms of payment', value: s.paymentTerms },
		{ label: 'Reason for export', value: s.exportReason }
	]);
	writeTable(
		frame,
		columns(s.currency),
		s.lines.map((l) => lineRow(l, s.minorUnits))
	);
	writeTotals(frame, s);
	writeMarks(frame, s.marks, `Packages: ${s.packages.text}`);
	if (s.originStatement) {
		const { agreement, text } = s.originStatement;
		writeTextBlock(
			frame,
			agreement ? `Statement on origin (${agreement})` : 'Statement on origin',
			text
		);
	}
	writeDeclaration(frame, s);
	writeCautions(frame, s.cautions);
	return finish(frame.doc, paperName(s));
}
