import { readFileSync } from 'node:fs';
import { expect, test, type Page } from '@playwright/test';
import { DEMO, apiAs, gotoHydrated, signInPage } from './helpers';

// The "done when": a coordinator issues both papers of the booked Hallvik shipment in the
// browser, the assigned broker downloads them (one PDF and the ZIP), and a reissue gives
// revision B with its reason. The demo shipment has every detail the papers need (seeders/005).

test.describe.configure({ mode: 'serial' });

let shipmentUrl = '';

test.beforeAll(async ({ baseURL }) => {
	// The seeded Hallvik shipment is the one broker Kaaiman is assigned to.
	const api = await apiAs(baseURL!, DEMO.broker);
	const list = await (await api.get('/api/v1/shipments?pageSize=100')).json();
	const ship = list.rows.find((r: { customerName: string }) =>
		r.customerName.startsWith('Hallvik')
	);
	expect(ship, 'the seeded Hallvik shipment').toBeTruthy();
	shipmentUrl = `/shipments/${ship.id}`;
	await api.dispose();
});

const papers = (page: Page) => page.getByRole('region', { name: 'Customs papers' });
const register = (page: Page) => papers(page).getByRole('table', { name: 'Document register' });

async function download(page: Page, link: ReturnType<Page['getByRole']>) {
	const [file] = await Promise.all([page.waitForEvent('download'), link.click()]);
	return { name: file.suggestedFilename(), bytes: readFileSync((await file.path())!) };
}

test('a coordinator issues the commercial invoice and the packing list', async ({ page }) => {
	test.setTimeout(60_000);
	await signInPage(page, DEMO.coordinator);
	await gotoHydrated(page, shipmentUrl);
	const panel = papers(page);
	await expect(panel.getByText('No papers have been issued yet.')).toBeVisible();
	await expect(panel.getByRole('list', { name: 'Missing before issue' })).toHaveCount(0);
	await expect(panel.getByRole('checkbox', { name: /Commercial invoice/ })).toBeChecked();
	await expect(panel.getByRole('checkbox', { name: /Packing list/ })).toBeChecked();
	await panel.getByRole('button', { name: 'Issue papers' }).click();
	await expect(panel.getByRole('status')).toHaveText(
		/^Issued CI-\d{4}-\d{5} rev\. A, PL-\d{4}-\d{5} rev\. A\.$/,
		{ timeout: 20_000 }
	);
	await expect(register(page).getByRole('row')).toHaveCount(3);
	await expect(register(page)).toContainText('Commercial invoice');
	await expect(register(page)).toContainText('Packing list');
	await expect(
		page.getByRole('region', { name: 'Status' }).getByText('Documents issued').first()
	).toBeVisible();

	const pdf = await download(
		page,
		panel.getByRole('link', { name: /^Download commercial invoice/ })
	);
	expect(pdf.name).toMatch(/^CI-\d{4}-\d{5}-A\.pdf$/);
	expect(pdf.bytes.subarray(0, 5).toString()).toBe('%PDF-');
});

test('a reissue after a step back is revision B, with its reason', async ({ page }) => {
	test.setTimeout(60_000);
	await signInPage(page, DEMO.coordinator);
	await gotoHydrated(page, shipmentUrl);
	const status = page.getByRole('region', { name: 'Status' });
	await status.getByLabel('Note (optional)').fill('Correct the seal number');
	await status.getByRole('button', { name: 'Mark booked' }).click();
	await expect(status.getByRole('button', { name: 'Mark documents issued' })).toBeVisible();

	const panel = papers(page);
	await panel.getByRole('checkbox', { name: /Commercial invoice/ }).check();
	await expect(panel.getByText('reissue as revision B')).toHaveCount(2);
	await panel.getByRole('button', { name: 'Reissue papers' }).click();
	await expect(panel.getByText('Say why the paper is issued again')).toBeVisible();
	await panel.getByLabel('Reason for the reissue').fill('Seal number corrected after stuffing');
	await panel.getByRole('button', { name: 'Reissue papers' }).click();
	await expect(panel.getByRole('status')).toHaveText(/^Issued CI-\d{4}-\d{5} rev\. B\.$/, {
		timeout: 20_000
	});
	const rows = register(page).getByRole('row');
	await expect(rows).toHaveCount(4);
	await expect(rows.nth(1)).toContainText('Current');
	await expect(rows.nth(1)).toContainText('Reason: Seal number corrected after stuffing');
	await expect(rows.nth(2)).toContainText('Superseded');
});

test('the assigned broker downloads one paper and the ZIP of the current ones', async ({
	page
}) => {
	await signInPage(page, DEMO.broker);
	await gotoHydrated(page, shipmentUrl);
	const panel = papers(page);
	await expect(register(page).getByRole('row')).toHaveCount(4);
	// Brokers download; they do not issue.
	await expect(panel.getByRole('button', { name: /Issue papers|Reissue papers/ })).toHaveCount(0);
	const pdf = await download(
		page,
		panel.getByRole('link', { name: /^Download commercial invoice .* revision B$/ })
	);
	expect(pdf.name).toMatch(/^CI-\d{4}-\d{5}-B\.pdf$/);
	expect(pdf.bytes.subarray(0, 5).toString()).toBe('%PDF-');
	const zip = await download(page, panel.getByRole('link', { name: /ZIP/ }));
	expect(zip.name).toMatch(/^SHP-\d{4}-\d{5}-papers\.zip$/);
	expect(zip.bytes.subarray(0, 2).toString()).toBe('PK');
	const names = zip.bytes.toString('latin1');
	expect(names).toMatch(/CI-\d{4}-\d{5}-B\.pdf/);
	expect(names).toMatch(/PL-\d{4}-\d{5}-A\.pdf/);
	expect(names).toContain('SHA256SUMS');
});
