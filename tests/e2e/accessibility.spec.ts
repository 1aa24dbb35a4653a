import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { DEMO, signInPage } from './helpers';

// Every page passes axe (WCAG 2.1 A/AA rules) with no serious or critical violation.
async function expectAccessible(page: Page, label: string) {
	const results = await new AxeBuilder({ page })
		.withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'])
		.analyze();
	const bad = results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
	expect(
		bad.map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`),
		label
	).toEqual([]);
}

test('sign-in page, also with errors shown', async ({ page }) => {
	await page.goto('/signin');
	await expectAccessible(page, '/signin');
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByText('Enter your password.')).toBeVisible();
	await expectAccessible(page, '/signin with field errors');
});

test('the set-password page of an unknown or used invitation', async ({ page }) => {
	await page.goto('/set-password/not-a-real-invitation-token-0000');
	await expect(page.getByRole('alert')).toHaveText(/no longer valid/);
	await expectAccessible(page, '/set-password (invalid link)');
});

test('every page an administrator sees', async ({ page }) => {
	test.setTimeout(120_000);
	await signInPage(page, DEMO.admin);
	await expect(page).toHaveURL('/');
	for (const path of [
		'/',
		'/organizations',
		'/admin/users',
		'/admin/audit',
		'/admin/mail',
		'/signout'
	]) {
		await page.goto(path);
		await expectAccessible(page, path);
	}
	await page.goto('/organizations');
	await page.getByRole('link', { name: 'Hallvik Heimtechnik GmbH' }).click();
	await expectAccessible(page, 'organization detail');
	await page.goto('/admin/users');
	await page.getByRole('link', { name: 'Daniel Tan Wei Jie' }).click();
	await expectAccessible(page, 'person detail');
	await page.goto('/no-such-page');
	await expectAccessible(page, '404 page');
});

test('the pages a customer sees, and the 403 page', async ({ page }) => {
	await signInPage(page, DEMO.customer);
	await expect(page).toHaveURL('/');
	await expectAccessible(page, 'customer overview');
	await page.getByRole('link', { name: 'Our company' }).click();
	await expectAccessible(page, 'customer organization');
	await page.goto('/organizations');
	await expectAccessible(page, '403 page');
});

test('the pages a coordinator works in', async ({ page }) => {
	test.setTimeout(120_000);
	await signInPage(page, DEMO.coordinator);
	for (const path of [
		'/shipments',
		'/shipments/new',
		'/products',
		'/products/new',
		'/places',
		'/parties',
		'/trace?q=PB20-000100'
	]) {
		await page.goto(path);
		await expectAccessible(page, path);
	}
	await page.goto('/shipments');
	await page.getByRole('link', { name: /^SHP-/ }).first().click();
	await expect(page.getByRole('heading', { name: /^SHP-/ })).toBeVisible();
	await expectAccessible(page, 'shipment detail');
	await page.goto('/products');
	await page.getByRole('link', { name: 'SLV-PBL-20' }).click();
	await expectAccessible(page, 'product detail');
});

test('the load-plan panel of a shipment, computed', async ({ page }) => {
	test.setTimeout(90_000);
	await signInPage(page, DEMO.coordinator);
	// The seeded Cedarpoint shipment (sea, full container), found by its reference: other specs add
	// shipments meanwhile, so "the newest" would be anyone's.
	await page.goto('/shipments?q=SHP-2026-00003');
	await page.getByRole('link', { name: 'SHP-2026-00003' }).click();
	const panel = page.getByRole('region', { name: 'Container load plan' });
	await panel.getByRole('button', { name: /^Compute/ }).click();
	await expect(panel.getByRole('img', { name: /^Three-dimensional view/ })).toBeVisible({
		timeout: 30_000
	});
	await expectAccessible(page, 'shipment detail with its load plan');
});

test('the master-data pages a coordinator edits', async ({ page }) => {
	test.setTimeout(120_000);
	await signInPage(page, DEMO.coordinator);
	for (const path of [
		'/equipment',
		'/equipment/pallet-types/new',
		'/equipment/container-types/new'
	]) {
		await page.goto(path);
		await expectAccessible(page, path);
	}
	for (const [list, link, label] of [
		['/places', 'MYPKG', 'place detail'],
		['/equipment', 'P1208', 'pallet type detail'],
		['/equipment', 'C20GP', 'container type detail']
	] as const) {
		await page.goto(list);
		await page.getByRole('link', { name: link, exact: true }).click();
		await expect(page.getByRole('heading', { name: new RegExp(`^${link}`) })).toBeVisible();
		await expectAccessible(page, label);
	}
	await page.goto('/parties');
	await page.locator('table a').first().click();
	await expect(page.getByRole('heading', { name: 'Edit the party' })).toBeVisible();
	await expectAccessible(page, 'party detail');
	await page.getByLabel('Name').fill('');
	await page.getByRole('button', { name: 'Save party' }).click();
	await expect(page.getByText('Enter the name.')).toBeVisible();
	await expectAccessible(page, 'party detail with a field error');
});

test('the pages finance works in: landed cost and its reference data', async ({
	page,
	baseURL
}) => {
	test.setTimeout(120_000);
	await signInPage(page, DEMO.finance);
	for (const path of [
		'/reference/exchange-rates',
		'/reference/tariffs',
		'/reference/rate-cards',
		'/reference/country-rules',
		'/reference/settings'
	]) {
		await page.goto(path);
		await expectAccessible(page, path);
	}
	for (const [list, link, label] of [
		['/reference/rate-cards', /→/, 'rate card detail'],
		['/reference/country-rules', 'US-MPF', 'customs fee detail']
	] as const) {
		await page.goto(list);
		await page.getByRole('link', { name: link }).first().click();
		await expect(page.getByRole('heading', { name: 'Edit' })).toBeVisible();
		await expectAccessible(page, label);
	}
	const list = await (await page.request.get(`${baseURL}/api/v1/shipments?pageSize=100`)).json();
	const ship = list.rows.find((r: { customerName: string }) =>
		r.customerName.startsWith('Wattlebird')
	);
	await page.goto(`/shipments/${ship.id}/landed-cost`);
	await expect(page.getByRole('table', { name: 'Landed cost by mode' })).toBeVisible({
		timeout: 30_000
	});
	await expectAccessible(page, 'landed-cost comparison');
});

test('the supporting-documents card, listed and with field errors', async ({ page }) => {
	test.setTimeout(60_000);
	await signInPage(page, DEMO.coordinator);
	// SLV-PBL-20 has a seeded UN38.3 summary on file (seeders/demo-supporting-documents.ts).
	await page.goto('/products');
	await page.getByRole('link', { name: 'SLV-PBL-20' }).click();
	const card = page.getByRole('region', { name: 'Supporting documents', exact: true });
	await expect(card.getByRole('table', { name: 'Supporting documents on file' })).toBeVisible();
	await card.getByRole('button', { name: 'Add the document' }).click();
	await expect(card.getByText('Choose what kind of document this is.')).toBeVisible();
	await expectAccessible(page, 'supporting documents with field errors');
});
