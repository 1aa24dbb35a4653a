/**
 * The blocks both papers share: the running header, the parties, the shipment and transport
 * facts, marks and numbers, and the cautions in small print.
 */
import type { DocumentHeader, PrintedParty, PrintedPlace } from '../../../documents/types';
import {
	COLOUR,
	CONTENT_WIDTH,
	MARGIN,
	PAGE,
	SIZE,
	plainText,
	rule,
	strongText,
	textHeight
} from './layout';
import { PageFrame, createDocument, type Doc } from './layout';

/** Title on the left, number / revision / date / shipment on the right, an accent rule below. */
export function drawRunningHeader(doc: Doc, h: DocumentHeader): number {
	const top = MARGIN.top;
	strongText(doc, h.title, MARGIN.left, top, { size: SIZE.title, lineBreak: false });
	plainText(doc, h.exporter.name, MARGIN.left, top + 21, {
		size: SIZE.small,
		colour: COLOUR.muted,
		width: CONTENT_WIDTH * 0.55,
		lineBreak: false
	});
	const facts: [string, string][] = [
		['Number', h.revision === 'A' ? h.number : `${h.number}  ·  Revision ${h.revision}`],
		['Date of issue', h.issuedOn],
		['Shipment', h.shipmentReference]
	];
	const labelX = PAGE.width - MARGIN.right - 200;
	facts.forEach(([label, value], i) => {
		const y = top + i * 11;
		plainText(doc, label, labelX, y + 1, {
			size: SIZE.label,
			colour: COLOUR.muted,
			lineBreak: false
		});
		plainText(doc, value, labelX + 58, y, { size: SIZE.body, width: 142, lineBreak: false });
	});
	const bottom = top + 36;
	rule(doc, bottom, COLOUR.accent, 0.9);
	return bottom + 8;
}

/** Under the header of page 1: why this revision replaces the earlier one. */
export function writeRevisionNote(frame: PageFrame, h: DocumentHeader): void {
	if (h.revision === 'A') return;
	const doc = frame.doc;
	const text = `Revision ${h.revision} replaces every earlier revision of ${h.number}${
		h.revisionReason ? `. Reason: ${h.revisionReason}` : ''
	}`;
	const height = textHeight(doc, text, CONTENT_WIDTH, SIZE.body);
	frame.ensure(height + 6);
	plainText(doc, text, MARGIN.left, frame.y, {
		width: CONTENT_WIDTH,
		size: SIZE.body,
		colour: COLOUR.accent
	});
	frame.y += height + 6;
}

export function sectionTitle(frame: PageFrame, title: string, keepWith = 30): void {
	frame.ensure(12 + keepWith);
	strongText(frame.doc, title.toUpperCase(), MARGIN.left, frame.y, {
		size: SIZE.label,
		colour: COLOUR.accent,
		characterSpacing: 0.6,
		lineBreak: false
	});
	frame.y += 10;
}

function partyText(p: PrintedParty): string {
	const lines = [...p.addressLines];
	for (const t of p.taxIds) lines.push(`${t.type} ${t.value}`);
	if (p.contact) lines.push(p.contact);
	return lines.join('\n');
}

/** Parties side by side, two to a row: a label, the name set heavier, address, tax ids. */
export function writeParties(
	frame: PageFrame,
	parties: readonly { label: string; party: PrintedParty | null; none?: string }[]
): void {
	const doc = frame.doc;
	const gutter = 14;
	const width = (CONTENT_WIDTH - gutter) / 2;
	for (let i = 0; i < parties.length; i += 2) {
		const pair = parties.slice(i, i + 2);
		const heights = pair.map(({ party, none }) =>
			party
				? textHeight(doc, party.name, width, SIZE.body) +
					textHeight(doc, partyText(party), width, SIZE.body - 0.5)
				: textHeight(doc, none ?? '—', width, SIZE.body)
		);
		const h = 9 + Math.max(...heights);
		frame.ensure(h + 8);
		pair.forEach(({ label, party, none }, k) => {
			const x = MARGIN.left + k * (width + gutter);
			let y = frame.y;
			plainText(doc, label, x, y, { size: SIZE.label, colour: COLOUR.accent, lineBreak: false });
			y += 9;
			if (!party) {
				plainText(doc, none ?? '—', x, y, { width, colour: COLOUR.muted });
				return;
			}
			strongText(doc, party.name, x, y, { width });
			y += textHeight(doc, party.name, width, SIZE.body);
			plainText(doc, partyText(party), x, y, { width, size: SIZE.body - 0.5 });
		});
		frame.y += h + 8;
	}
}

/** Label-over-value cells in `columns` columns; a cell may span the whole row. */
export function writeFacts(
	frame: PageFrame,
	facts: readonly { label: string; value: string; wide?: boolean }[],
	columns = 3
): void {
	const doc = frame.doc;
	const gutter = 10;
	const cell = (CONTENT_WIDTH - gutter * (columns - 1)) / columns;
	const rows: (typeof facts)[number][][] = [];
	for (const f of facts) {
		const last = rows.at(-1);
		if (f.wide || !last || last.length >= columns || last[0]!.wide) rows.push([f]);
		else last.push(f);
	}
	for (const row of rows) {
		const widthOf = (f: (typeof facts)[number]) => (f.wide ? CONTENT_WIDTH : cell);
		const h = 8 + Math.max(...row.map((f) => textHeight(doc, f.value, widthOf(f), SIZE.body)));
		frame.ensure(h + 5);
		row.forEach((f, k) => {
			const x = MARGIN.left + k * (cell + gutter);
			plainText(doc, f.label, x, frame.y, {
				size: SIZE.label,
				colour: COLOUR.muted,
				lineBreak: false
			});
			plainText(doc, f.value, x, frame.y + 8, { width: widthOf(f) });
		});
		frame.y += h + 5;
	}
}

function place(p: PrintedPlace): string {
	return `${p.name} (${p.code}), ${p.countryName}`;
}

/** The shipment and transport facts both papers print; `extra` adds paper-specific ones. */
export function transportFacts(
	h: DocumentHeader,
	extra: { label: string; value: string; wide?: boolean }[] = []
): { label: string; value: string; wide?: boolean }[] {
	const or = (v: string | null) => v ?? '—';
	const containers = h.containers.length
		? h.containers
				.map((c) =>
					[c.number, c.type, `seal ${c.seal ?? 'not yet recorded'}`].filter(Boolean).join(', ')
				)
				.join(';  ')
		: 'None recorded';
	return [
		{ label: 'Shipment reference', value: h.shipmentReference },
		{ label: 'Incoterms® 2020 rule and named place', value: h.incoterm.text },
		{ label: 'Mode of transport', value: or(h.mode) },
		{ label: 'From → to', value: `${place(h.origin)} → ${place(h.destination)}`, wide: true },
		{ label: 'Carrier', value: or(h.carrier) },
		{ label: 'Vessel or flight', value: or(h.vesselOrFlight) },
		{ label: 'Voyage or flight number', value: or(h.voyageOrFlight) },
		{ label: 'Booking number', value: or(h.bookingNumber) },
		{ label: 'Estimated departure (ETD)', value: or(h.etd) },
		{ label: 'Estimated arrival (ETA)', value: or(h.eta) },
		...extra,
		{ label: 'Containers and seals', value: containers, wide: true }
	];
}

/** Marks and numbers as given, line breaks kept. */
export function writeMarks(frame: PageFrame, marks: string, numbers: string): void {
	writeTextBlock(frame, 'Marks and numbers', `${marks.trim() || 'No marks recorded'}\n${numbers}`);
}

/** A titled block of the user's free text (e.g. the statement on origin), wrapped to the page. */
export function writeTextBlock(frame: PageFrame, title: string, text: string): void {
	const h = textHeight(frame.doc, text, CONTENT_WIDTH, SIZE.body);
	sectionTitle(frame, title, h);
	plainText(frame.doc, text, MARGIN.left, frame.y, { width: CONTENT_WIDTH });
	frame.y += h + 8;
}

/** The cautions of the snapshot, small print at the foot of the document. */
export function writeCautions(frame: PageFrame, cautions: readonly string[]): void {
	if (cautions.length === 0) return;
	const doc = frame.doc;
	const text = cautions.map((c) => `• ${c}`).join('\n');
	const h = textHeight(doc, text, CONTENT_WIDTH, SIZE.small);
	frame.gap(4);
	sectionTitle(frame, 'Please note', Math.min(h, 60));
	// Long cautions may run onto the next page: write them one by one.
	for (const c of cautions) {
		const line = `• ${c}`;
		const ch = textHeight(doc, line, CONTENT_WIDTH, SIZE.small);
		frame.ensure(ch + 2);
		plainText(doc, line, MARGIN.left, frame.y, {
			width: CONTENT_WIDTH,
			size: SIZE.small,
			colour: COLOUR.muted
		});
		frame.y += ch + 2;
	}
}

/**
 * The opening of both papers: the file, page 1 with its running header, the revision note, the
 * four parties and the shipment and transport facts (`extra` adds the paper's own).
 */
export function openPaper(
	h: DocumentHeader,
	snapshot: unknown,
	exporterLabel: string,
	extra: { label: string; value: string; wide?: boolean }[] = []
): PageFrame {
	const doc = createDocument({
		title: `${h.title} ${h.number} revision ${h.revision}`,
		subject: `Shipment ${h.shipmentReference}`,
		issuedOn: h.issuedOn,
		snapshot
	});
	const frame = new PageFrame(doc, (d) => drawRunningHeader(d, h));
	frame.newPage();
	writeRevisionNote(frame, h);
	writeParties(frame, [
		{ label: exporterLabel, party: h.exporter },
		{ label: 'Buyer', party: h.buyer },
		{ label: 'Consignee', party: h.consignee },
		{ label: 'Notify party', party: h.notifyParty, none: 'Same as consignee' }
	]);
	rule(doc, frame.y - 4);
	frame.gap(4);
	writeFacts(frame, transportFacts(h, extra));
	frame.gap(4);
	return frame;
}

/** The document's name in the footer: 'Packing list PL-2026-00017 rev. B'. */
export function paperName(h: DocumentHeader): string {
	return `${h.title} ${h.number}${h.revision === 'A' ? '' : ` rev. ${h.revision}`}`;
}
