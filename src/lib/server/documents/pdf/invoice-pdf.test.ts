import { createHash } from 'node:crypto';
import cc from 'currency-codes';
import { Decimal } from 'decimal.js';
import { describe, expect, it } from 'vitest';
import type { InvoiceSnapshot } from '../../../documents/types';
import { invoiceFixture } from './fixtures';
import { renderInvoicePdf } from './invoice-pdf';
import { firstPagePng, hasPdftoppm, pdfInfo, pdfPages, pngSize, unprint } from './read-back';

const TITLES = 'No. Description of goods HS code Origin Quantity Unit Unit price EUR Amount EUR';

function escape(s: string): string {
	return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/** Every printed line row in order: HS code, origin, quantity, unit, unit price, amount. */
function printedLines(text: string, s: InvoiceSnapshot) {
	const codes = [...new Set(s.lines.map((l) => l.hsCode))].map(escape).join('|');
	const row = new RegExp(`(${codes}) ([A-Z]{2}) ([\\d,]+) (\\S+) ([\\d,.]+) ([\\d,.]+)`, 'g');
	return [...text.matchAll(row)].map((m) => ({
		hsCode: m[1],
		origin: m[2],
		quantity: Number(unprint(m[3]!)),
		unit: m[4],
		unitPrice: unprint(m[5]!),
		amount: unprint(m[6]!)
	}));
}

function figure(text: string, label: RegExp): string {
	const m = label.exec(text);
	if (!m) throw new Error(`${label} not printed`);
	return unprint(m[1]!);
}

describe('renderInvoicePdf', () => {
	it('prints every line, the totals, weights and packages as in the snapshot', async () => {
		const s = invoiceFixture({ lines: 12 });
		const { pdf, pages } = await renderInvoicePdf(s);
		const { text, total } = await pdfPages(pdf);
		expect(total).toBe(pages);

		const rows = printedLines(text, s);
		expect(rows).toHaveLength(s.lines.length);
		rows.forEach((r, i) => {
			const l = s.lines[i]!;
			expect(r.hsCode).toBe(l.hsCode);
			expect(r.origin).toBe(l.originCountry);
			expect(r.quantity).toBe(l.quantity);
			expect(r.unit).toBe(l.unit);
			expect(new Decimal(r.unitPrice).eq(l.unitPrice)).toBe(true);
			expect(r.amount).toBe(l.amount);
		});
		expect(figure(text, /Subtotal of the lines \(EUR\) ([\d,.]+)/)).toBe(s.subtotal);
		expect(figure(text, /Freight ([\d,.]+)/)).toBe(s.freight.amount);
		expect(figure(text, /Insurance ([\d,.]+)/)).toBe(s.insurance.amount);
		expect(figure(text, /Total CIF \(EUR\) ([\d,.]+)/)).toBe(s.total);
		expect(figure(text, /Total net weight\s+([\d,.]+) kg/)).toBe(s.netKg);
		expect(figure(text, /Total gross weight\s+([\d,.]+) kg/)).toBe(s.grossKg);
		expect(text).toContain(`Number of packages\n${s.packages.text}`);
		expect(text).toContain(s.incoterm.text);
		expect(text).toContain('LNFU 123456 7, 40′ high cube (45G1), seal SV-0048213');
		expect(text).toContain(s.freight.note);
		expect(text).toContain(s.declaration.signatoryName);
		expect(text).toContain(s.declaration.signatoryTitle);
		for (const c of s.cautions) expect(text.replace(/\s+/g, ' ')).toContain(c);
	});

	it('shows freight and insurance as not included under FOB, and the revision and its reason', async () => {
		const s = invoiceFixture({ lines: 3, incoterm: 'FOB', revision: 'B' });
		const { pdf } = await renderInvoicePdf(s);
		const { text } = await pdfPages(pdf);
		expect(text).toMatch(/Freight Not included\s+Not included: the buyer’s cost under FOB/);
		expect(text).toMatch(/Insurance Not included/);
		expect(figure(text, /Total FOB \(EUR\) ([\d,.]+)/)).toBe(s.subtotal);
		expect(text).toContain('CI-2026-00017 · Revision B');
		expect(text).toContain(`Reason: ${s.revisionReason}`);
	});

	it('spreads a 300-line invoice over pages, each with the header, column titles and "Page i of N"', async () => {
		const s = invoiceFixture({ lines: 300 });
		const { pdf, pages } = await renderInvoicePdf(s);
		const read = await pdfPages(pdf);
		expect(pages).toBeGreaterThan(1);
		expect(read.total).toBe(pages);
		read.pages.forEach((page, i) => {
			expect(page).toContain('Commercial invoice');
			expect(page).toContain('CI-2026-00017');
			expect(page).toContain(`Page ${i + 1} of ${pages}`);
			expect(page).not.toMatch(new RegExp(`Page \\d+ of (?!${pages}\\b)\\d+`));
		});
		// Column titles on every page the table reaches (all but possibly the last).
		const withRows = read.pages.filter((p) => /\n\d+ .+\n/.test(p) && p.includes(' pcs '));
		expect(withRows.length).toBeGreaterThan(1);
		for (const p of withRows) expect(p).toContain(TITLES);
		expect(printedLines(read.text, s).map((r) => r.amount)).toEqual(s.lines.map((l) => l.amount));
		expect(figure(read.text, /Total CIF \(EUR\) ([\d,.]+)/)).toBe(s.total);
	});

	// ISO 4217 List One (edition 2024-06-25, via currency-codes 2.2.0): JPY 0, KWD 3 minor units.
	it('prints JPY amounts with 0 decimals and KWD with 3', async () => {
		for (const code of ['JPY', 'KWD'] as const) {
			const s = invoiceFixture({ lines: 6, currency: code });
			expect(s.minorUnits).toBe(cc.code(code)!.digits);
			const { text } = await pdfPages((await renderInvoicePdf(s)).pdf);
			const rows = printedLines(text, s);
			expect(rows).toHaveLength(6);
			const shape = code === 'JPY' ? /^\d{1,3}(,\d{3})*$/ : /^\d{1,3}(,\d{3})*\.\d{3}$/;
			const total = new RegExp(`Total CIF \\(${code}\\) ([\\d,.]+)`).exec(text)![1]!;
			for (const printed of [
				total,
				...text.matchAll(/ pcs [\d,.]+ ([\d,.]+)/g).map((m) => m[1]!)
			]) {
				expect(printed).toMatch(shape);
			}
			expect(unprint(total)).toBe(s.total);
		}
	});

	it('refuses an amount that was not rounded to the currency rather than round it', async () => {
		const s = invoiceFixture({ lines: 2 });
		s.lines[1]!.amount = '12.345';
		await expect(renderInvoicePdf(s)).rejects.toThrow(/amount '12.345' with 2 decimals/);
	});

	it('gives the same bytes for the same snapshot, dated from the snapshot', async () => {
		const a = await renderInvoicePdf(invoiceFixture({ lines: 20 }));
		const b = await renderInvoicePdf(invoiceFixture({ lines: 20 }));
		expect(a.pdf.equals(b.pdf)).toBe(true);
		const raw = a.pdf.toString('latin1');
		const info = await pdfInfo(a.pdf);
		expect(info.CreationDate).toMatch(/^D:20260302000000Z/);
		expect(info.ModDate).toMatch(/^D:20260302000000Z/);
		const custom = info.Custom as Record<string, string>;
		expect(custom.LandfallSnapshotSha256).toBe(
			createHash('sha256')
				.update(JSON.stringify(invoiceFixture({ lines: 20 })))
				.digest('hex')
		);
		const id = /\/ID \[<([0-9a-f]+)>/.exec(raw)![1];
		const other = (await renderInvoicePdf(invoiceFixture({ lines: 20, revision: 'B' }))).pdf;
		expect(/\/ID \[<([0-9a-f]+)>/.exec(other.toString('latin1'))![1]).not.toBe(id);
	});

	it('renders page 1 to a PNG with pdftoppm', async (ctx) => {
		if (!hasPdftoppm()) ctx.skip('pdftoppm is missing: apt-get install poppler-utils');
		const { pdf } = await renderInvoicePdf(invoiceFixture({ lines: 12 }));
		const png = pngSize(firstPagePng(pdf, 'invoice'));
		// A4 at 60 dpi: 595.28 × 841.89 pt → 496.1 × 701.6 px (poppler rounds up).
		expect(png.width).toBeGreaterThanOrEqual(496);
		expect(png.width).toBeLessThanOrEqual(497);
		expect(png.height).toBeGreaterThanOrEqual(701);
		expect(png.height).toBeLessThanOrEqual(702);
		expect(png.bytes).toBeGreaterThan(20_000);
	});
});
