import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import * as devalue from 'devalue';
import pg from 'pg';
import { PDFParse } from 'pdf-parse';
import { freshShipment, shipmentJson, type ShipmentJson } from './fuzz-fixtures';
import { DEMO, apiAs, signInPage } from './helpers';
import { pageForms, parseActionResult, type ActionResult } from './superform-data';

// Injection stays inert: script, markup, SQL and template text saved into the main text fields
// (party and place names, a product description, a shipment's notes, named place and carrier,
// the papers' marks and signatory, a lot number) is stored as typed, shown literally on every
// page that shows it (no script runs, no element appears, no dialog opens), leaves every table
// in place, and prints as typed on the commercial invoice and packing list.

const SCRIPT = '<script>window.__pwned=1</script>';
const IMG = '<img src=x onerror=window.__pwned=1>';
const SQL = "'); DROP TABLE shipments;--";
const TEMPLATE = '{{7*7}} ${7*7}';

const unique = Date.now().toString(36).toUpperCase();
const TEXT = {
	party: `Inert ${unique} ${SCRIPT}`,
	place: `Inert ${unique} ${IMG}`,
	product: `Speaker ${unique} ${SQL} ${TEMPLATE}`,
	notes: [SCRIPT, IMG, SQL, TEMPLATE].join(' | '),
	incotermPlace: `Port Klang ${TEMPLATE}`,
	carrier: IMG,
	marks: SCRIPT,
	signatory: SQL,
	lot: SCRIPT
};

const ACTION = { 'x-sveltekit-action': 'true', accept: 'application/json' };

/**
 * Submits a page's superform the way use:enhance does (__superform_json), starting from the
 * values the page loaded for the form that has every changed field.
 */
async function submit(
	client: APIRequestContext,
	page: string,
	action: string,
	changes: Record<string, unknown>
): Promise<ActionResult> {
	const forms = await pageForms(client, page);
	const form = forms.find((f) => Object.keys(changes).every((k) => k in f.data));
	expect(form, `a form on ${page} with ${Object.keys(changes).join(', ')}`).toBeDefined();
	const response = await client.post(action ? `${page}?/${action}` : page, {
		headers: ACTION,
		form: {
			__superform_id: form!.id,
			__superform_json: devalue.stringify({ ...form!.data, ...changes })
		}
	});
	const result = parseActionResult(await response.text());
	expect(['success', 'redirect'], `${page} ${action}: ${JSON.stringify(result)}`).toContain(
		result.type
	);
	return result;
}

/** Visible text and the values of form fields: where a saved text can be shown. */
const shown = (page: Page) =>
	page.evaluate(() =>
		[
			document.body.innerText,
			...[...document.querySelectorAll('input, textarea')].map(
				(e) => (e as HTMLInputElement).value
			),
			...[...document.querySelectorAll('select option:checked')].map((o) => o.textContent ?? '')
		].join('\n')
	);

test.describe('injection stays inert', () => {
	const db = new pg.Client({ connectionString: process.env.DATABASE_URL });
	let coordinator: APIRequestContext;
	let ship: ShipmentJson;
	let ids: { party: string; place: string; product: string };

	test.beforeAll(async ({ baseURL }) => {
		test.setTimeout(90_000);
		await db.connect();
		coordinator = await apiAs(baseURL!, DEMO.coordinator);
		const one = async (sql: string, value: string) =>
			((await db.query<{ id: string }>(sql, [value])).rows[0]?.id ?? '') as string;

		await submit(coordinator, '/parties', '', {
			name: TEXT.party,
			line1: '1 Harbour Road',
			city: 'Hamburg',
			countryCode: 'DE'
		});
		const code = `DE${unique
			.replace(/[^A-Z]/g, 'Q')
			.slice(-3)
			.padStart(3, 'Q')}`;
		await submit(coordinator, '/places', '', {
			code,
			name: TEXT.place,
			kind: 'seaport',
			countryCode: 'DE'
		});
		// A product like the seeded Pebble speaker, with the hostile description.
		const pebble = await one('SELECT id FROM products WHERE sku = $1', 'SLV-PBL-20');
		const [pebbleForm] = await pageForms(coordinator, `/products/${pebble}`);
		const sku = `INERT-${unique}`;
		await submit(coordinator, '/products/new', '', {
			...pebbleForm!.data,
			sku,
			description: TEXT.product,
			version: 0
		});
		ids = {
			party: await one('SELECT id FROM parties WHERE name = $1', TEXT.party),
			place: await one('SELECT id FROM places WHERE code = $1', code),
			product: await one('SELECT id FROM products WHERE sku = $1', sku)
		};
		expect(Object.values(ids).every(Boolean), JSON.stringify(ids)).toBe(true);

		// Hallvik's seeded shipment, copied with the hostile party, place, texts and product.
		const { rows } = await db.query<{ id: string }>(
			`SELECT s.id FROM shipments s JOIN organizations o ON o.id = s.customer_id
			 WHERE o.name LIKE 'Hallvik%' AND s.broker_id IS NOT NULL ORDER BY s.created_at LIMIT 1`
		);
		const hallvik = rows[0]!.id;
		const template = await shipmentJson(coordinator, hallvik);
		// First, so its 12 units fill carton 1 (the seeded Pebble carton holds 12).
		template.lines = [{ productId: ids.product, quantity: 12, unitPrice: '' }, ...template.lines];
		ship = await freshShipment(coordinator, template, {
			consigneeId: ids.party,
			destinationId: ids.place,
			notes: TEXT.notes,
			incotermPlace: TEXT.incotermPlace,
			carrier: TEXT.carrier
		});
		const page = `/shipments/${ship.id}`;
		await submit(coordinator, page, 'papers', {
			paymentTerms: '30 days net',
			exportReason: 'Sale',
			marks: TEXT.marks,
			signatoryName: TEXT.signatory,
			signatoryTitle: 'Export coordinator',
			signingPlace: 'Penang'
		});
		await submit(coordinator, page, 'addLot', {
			productId: ids.product,
			cartonFrom: 1,
			cartonTo: 1,
			lotNumber: TEXT.lot,
			serialFrom: `INERT${unique}-01`,
			serialTo: `INERT${unique}-12`
		});
		const booked = await coordinator.post(`${page}?/status`, {
			headers: ACTION,
			form: {
				to: 'booked',
				note: SQL,
				version: String((await shipmentJson(coordinator, ship.id)).version)
			}
		});
		expect(parseActionResult(await booked.text()).type).toBe('success');
		await submit(coordinator, page, 'issuePapers', {
			kinds: ['commercial_invoice', 'packing_list'],
			reason: ''
		});
	});

	test.afterAll(async () => {
		await db.end();
		await coordinator?.dispose();
	});

	test('the texts are stored as typed and every table is still there', async () => {
		const { rows } = await db.query<{ notes: string; incoterm_place: string }>(
			'SELECT notes, incoterm_place FROM shipments WHERE id = $1',
			[ship.id]
		);
		expect(rows[0]).toEqual({ notes: TEXT.notes, incoterm_place: TEXT.incotermPlace });
		for (const table of ['shipments', 'parties', 'places', 'products', 'shipment_lots', 'users']) {
			const found = await db.query<{ n: string }>(`SELECT count(*) AS n FROM ${table}`);
			expect(Number(found.rows[0]!.n), table).toBeGreaterThan(0);
		}
	});

	const screens: [string, (s: ShipmentJson, i: typeof ids) => string, string[]][] = [
		['parties list', () => '/parties', [TEXT.party]],
		['party', (_, i) => `/parties/${i.party}`, [TEXT.party]],
		['places list', () => '/places', [TEXT.place]],
		['place', (_, i) => `/places/${i.place}`, [TEXT.place]],
		['products list', () => '/products', [TEXT.product]],
		['product', (_, i) => `/products/${i.product}`, [TEXT.product]],
		// The list shows references, codes and the customer: nothing typed here, but it must
		// still render with these shipments in it.
		['shipments list', () => '/shipments', []],
		[
			'shipment',
			(s) => `/shipments/${s.id}`,
			// The notes are stored (checked above) but no screen shows them.
			[TEXT.incotermPlace, TEXT.carrier, TEXT.party, TEXT.product, TEXT.lot, TEXT.marks, SQL]
		],
		['trace', () => `/trace?q=INERT${unique}-05`, [TEXT.lot]]
	];

	for (const [name, path, texts] of screens) {
		test(`the ${name} page shows them literally and runs none`, async ({ page }) => {
			const dialogs: string[] = [];
			page.on('dialog', (d) => {
				dialogs.push(d.message());
				void d.dismiss();
			});
			await signInPage(page, DEMO.coordinator);
			await page.goto(path(ship, ids));
			await page.waitForLoadState('networkidle');
			const text = await shown(page);
			for (const t of texts) expect(text, `${name} shows ${t}`).toContain(t);
			expect(await page.evaluate(() => (window as { __pwned?: unknown }).__pwned)).toBeUndefined();
			expect(await page.locator('img[src="x"]').count()).toBe(0);
			expect(dialogs).toEqual([]);
		});
	}

	test('the customer sees the shipment literally too', async ({ page }) => {
		await signInPage(page, DEMO.customer);
		await page.goto(`/shipments/${ship.id}`);
		await page.waitForLoadState('networkidle');
		const text = await shown(page);
		for (const t of [TEXT.incotermPlace, TEXT.product]) expect(text).toContain(t);
		expect(await page.evaluate(() => (window as { __pwned?: unknown }).__pwned)).toBeUndefined();
	});

	test('the audit trail shows the saved values literally', async ({ page }) => {
		await signInPage(page, DEMO.admin);
		await page.goto('/admin/audit');
		await page.waitForLoadState('networkidle');
		expect(await shown(page)).toContain(unique);
		expect(await page.evaluate(() => (window as { __pwned?: unknown }).__pwned)).toBeUndefined();
		expect(await page.locator('img[src="x"]').count()).toBe(0);
	});

	test('the invoice and the packing list print them as typed', async () => {
		const { papers } = (await (
			await coordinator.get(`/api/v1/shipments/${ship.id}/documents`)
		).json()) as { papers: { id: string; kind: string }[] };
		expect(papers.map((p) => p.kind).sort()).toEqual(['commercial_invoice', 'packing_list']);
		let printed = '';
		for (const paper of papers) {
			const response = await coordinator.get(`/api/v1/shipments/${ship.id}/documents/${paper.id}`);
			expect(response.status()).toBe(200);
			const parser = new PDFParse({ data: new Uint8Array(await response.body()) });
			try {
				printed += (await parser.getText()).text;
			} finally {
				await parser.destroy();
			}
		}
		// Lines wrap where the layout needs: compare without whitespace.
		const flat = printed.replace(/\s+/g, '');
		for (const t of [TEXT.party, TEXT.product, TEXT.incotermPlace, SCRIPT, SQL]) {
			expect(flat, t).toContain(t.replace(/\s+/g, ''));
		}
	});
});
