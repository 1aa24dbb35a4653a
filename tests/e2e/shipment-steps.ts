import { expect, type Page } from '@playwright/test';
import { gotoHydrated } from './helpers';

// Steps shared by the shipment specs: the demo catalogue's products, the page's regions, and
// creating a draft, adding and saving lines as a coordinator does (seeders/demo-catalogue.ts).

export const REFERENCE = /SHP-\d{4}-\d{5}/;
export const COORDINATOR_NAME = 'Daniel Tan Wei Jie';
export const PEBBLE = 'SLV-PBL-20 — Pebble 20 portable speaker, rechargeable, blue';
export const POWER_BANK = 'SLV-PWR-20K — Ridge 20000 mAh power bank, USB-C';
export const HUB = 'SLV-HUB-01 — Hearth smart-home hub, mains powered (packaging not yet measured)';

export const region = (page: Page, name: string) => page.getByRole('region', { name, exact: true });
export const linesRegion = (page: Page) => region(page, 'Lines');
export const measuresRegion = (page: Page) =>
	region(page, 'Cartons, weights and chargeable weight');
export const statusRegion = (page: Page) => region(page, 'Status');
export const headerRegion = (page: Page) => region(page, 'Parties, terms and transport');
export const containersRegion = (page: Page) => region(page, 'Containers and seals');

/** The value (product id) of the option with this label in a line's product select. */
export async function productValue(page: Page, line: number, label: string) {
	const value = await linesRegion(page)
		.getByLabel(`Product of line ${line}`)
		.getByRole('option', { name: label, exact: true })
		.getAttribute('value');
	expect(value, `option ${label}`).toBeTruthy();
	return value!;
}

/** Fills the new-shipment form as the brief's booking and submits it; returns the page's URL. */
export async function createDraftShipment(page: Page): Promise<{ url: string; reference: string }> {
	await gotoHydrated(page, '/shipments');
	await page.getByRole('link', { name: 'New shipment' }).click();
	await expect(page.getByRole('heading', { level: 1, name: 'New shipment' })).toBeVisible();

	await page.getByLabel('Customer (buyer)').selectOption({ label: 'Hallvik Heimtechnik GmbH' });
	await page.getByLabel('Incoterms® 2020 rule').selectOption('FCA');
	await page.getByLabel('Named place').fill('Port Klang');
	await page.getByLabel('From', { exact: true }).selectOption({ label: 'MYPKG — Port Klang' });
	await page.getByLabel('To', { exact: true }).selectOption({ label: 'DEHAM — Hamburg' });
	await expect(page.getByLabel('Currency')).toHaveValue('USD');
	await page.getByRole('button', { name: 'Create draft shipment' }).click();

	await expect(page).toHaveURL(/\/shipments\/[0-9a-f-]{36}$/);
	const heading = page.getByRole('heading', { level: 1 });
	await expect(heading).toHaveText(REFERENCE);
	return { url: page.url(), reference: (await heading.textContent())!.trim() };
}

/** Adds one line in the editor (not saved). */
export async function addLine(page: Page, line: number, product: string, quantity: string) {
	const lines = linesRegion(page);
	await lines.getByRole('button', { name: 'Add line' }).click();
	await lines.getByLabel(`Product of line ${line}`).selectOption({ label: product });
	await lines.getByLabel(`Quantity of line ${line}`).fill(quantity);
}

export async function saveLines(page: Page) {
	await linesRegion(page).getByRole('button', { name: 'Save lines' }).click();
}
