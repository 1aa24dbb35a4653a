import { describe, expect, it } from 'vitest';
import { packingListFixture, picturesFixture } from './fixtures';
import { renderPackingListPdf } from './packing-list-pdf';
import { firstPagePng, hasPdftoppm, pdfPages, pngSize, unprint } from './read-back';

const TITLES = 'Carton nos. Cartons Contents';

/** Printed table rows: carton range, cartons, …, units, net, gross, dimensions, volume, pallets. */
function printedRows(text: string) {
	const flat = text.replace(/\n/g, ' ');
	const row =
		/(\d+)–(\d+) ([\d,]+) SLV-[A-Z0-9-]+ .*? ([\d,]+) ([\d,]+) ([\d,]+\.\d{3}) each [\d,.]+ ([\d,]+\.\d{3}) each [\d,.]+ (\d+ × \d+ × \d+) ([\d,]+\.\d{3}) (P\d+–P\d+|Loose)/g;
	return [...flat.matchAll(row)].map((m) => ({
		from: Number(m[1]),
		to: Number(m[2]),
		cartons: Number(unprint(m[3]!)),
		units: Number(unprint(m[5]!)),
		netKg: unprint(m[6]!),
		grossKg: unprint(m[7]!),
		dims: m[8],
		volumeM3: unprint(m[9]!),
		pallets: m[10]
	}));
}

describe('renderPackingListPdf', () => {
	it('prints every carton run and the totals as in the snapshot', async () => {
		const s = packingListFixture({ rows: 6 });
		const { pdf, pages } = await renderPackingListPdf(s);
		const { text, total } = await pdfPages(pdf);
		expect(total).toBe(pages);
		const rows = printedRows(text);
		expect(rows).toHaveLength(s.rows.length);
		rows.forEach((r, i) => {
			const e = s.rows[i]!;
			expect(r).toEqual({
				from: e.fromCarton,
				to: e.toCarton,
				cartons: e.cartons,
				units: e.units,
				netKg: e.netKg,
				grossKg: e.grossKg,
				dims: `${e.lengthMm} × ${e.widthMm} × ${e.heightMm}`,
				volumeM3: e.volumeM3,
				pallets: e.pallets
			});
		});
		// Lots wrap within their cell: compare without white space.
		const dense = text.replace(/\s+/g, '');
		for (const lot of s.rows.flatMap((r) => r.lots))
			expect(dense).toContain(lot.replace(/\s+/g, ''));
		const t = s.totals;
		const totals = /Total ([\d,]+) ([\d,]+) ([\d,.]+) ([\d,.]+) ([\d,.]+) (\d+)/.exec(text)!;
		expect(totals.slice(1).map(unprint)).toEqual([
			String(t.cartons),
			String(t.units),
			t.netKg,
			t.grossKg,
			t.volumeM3,
			String(t.pallets!.count)
		]);
		expect(text).toMatch(
			new RegExp(
				`Gross weight with pallets\\s+${t.pallets!.grossKg.replace(/\B(?=(\d{3})+\.)/g, ',')} kg`
			)
		);
		expect(text).toContain('LNFU 123456 7, 40′ high cube (45G1), seal SV-0048213');
		expect(text).toContain('LNFU 765432 0, 20′ general purpose (22G1), seal not yet recorded');
		expect(text).toContain(`C/NO. 1–${t.cartons}`);
		expect(text).toContain('Container 1 40′ high cube 6 71.4 3,120.000');
		for (const c of s.cautions) expect(text.replace(/\s+/g, ' ')).toContain(c);
		expect(text).not.toContain('Load plan pictures');
	});

	it('repeats the header and column titles on every page of a long list', async () => {
		const s = packingListFixture({ rows: 80 });
		const { pdf, pages } = await renderPackingListPdf(s);
		const read = await pdfPages(pdf);
		expect(pages).toBeGreaterThan(2);
		read.pages.forEach((page, i) => {
			expect(page).toContain('Packing list');
			expect(page).toContain('PL-2026-00017');
			expect(page).toContain(`Page ${i + 1} of ${pages}`);
		});
		const withRows = read.pages.filter((p) => /\d+–\d+ [\d,]+ SLV-/.test(p));
		expect(withRows.length).toBeGreaterThan(1);
		for (const p of withRows) expect(p).toContain(TITLES);
		expect(printedRows(read.text)).toHaveLength(80);
	});

	it('puts the load-plan pictures on their own pages, two to a page, with their legends', async () => {
		const s = packingListFixture({ rows: 4 });
		const pictures = picturesFixture();
		const plain = await renderPackingListPdf(s);
		const { pdf, pages } = await renderPackingListPdf(s, pictures);
		expect(pages).toBe(plain.pages + Math.ceil(pictures.length / 2));
		const read = await pdfPages(pdf);
		const picturePages = read.pages.slice(plain.pages);
		for (const p of picturePages) expect(p).toContain('LOAD PLAN PICTURES');
		expect(picturePages[0]).toContain(pictures[0]!.label);
		expect(picturePages[0]).toContain(pictures[1]!.label);
		expect(picturePages[1]).toContain(pictures[2]!.label);
		expect(picturePages[0]).toContain('SLV-PBL-20: 8 pieces');
		expect(picturePages[0]).toContain('Door');
	});

	it('gives the same bytes for the same snapshot and pictures', async () => {
		const a = await renderPackingListPdf(packingListFixture(), picturesFixture());
		const b = await renderPackingListPdf(packingListFixture(), picturesFixture());
		expect(a.pdf.equals(b.pdf)).toBe(true);
	});

	it('renders page 1 to a PNG with pdftoppm', async (ctx) => {
		if (!hasPdftoppm()) ctx.skip('pdftoppm is missing: apt-get install poppler-utils');
		const { pdf } = await renderPackingListPdf(packingListFixture(), picturesFixture());
		const png = pngSize(firstPagePng(pdf, 'packing-list'));
		expect(png.width).toBeGreaterThanOrEqual(496);
		expect(png.height).toBeGreaterThanOrEqual(701);
		expect(png.bytes).toBeGreaterThan(20_000);
	});
});
