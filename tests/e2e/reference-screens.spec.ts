import { expect, test } from '@playwright/test';
import { DEMO, apiAs, gotoHydrated, signInPage } from './helpers';

// Finance keeps the rate cards and the country rules: a card added with its mode's fields, then
// edited (a surcharge added); a customs fee added and edited. A coordinator reads but may not
// change them, even by posting the form directly.

const letters = () =>
	Array.from({ length: 3 }, () => 'ABCDEFGHJKLMNPQRSTUVWXYZ'[Math.floor(Math.random() * 24)]).join(
		''
	);

test('finance adds a road rate card and edits it', async ({ page }) => {
	test.setTimeout(60_000);
	const to = `TH${letters()}`;
	await signInPage(page, DEMO.finance);
	await gotoHydrated(page, '/reference/rate-cards');
	await expect(page.getByRole('heading', { name: 'Rate cards', level: 1 })).toBeVisible();
	await expect(page.getByRole('complementary', { name: 'Caution' })).toContainText(
		'Estimates only'
	);

	const add = page.getByRole('region', { name: 'Add a rate card' });
	await add.getByLabel('Mode').selectOption('road');
	await expect(add.getByRole('group', { name: 'Rates · Road' })).toBeVisible();
	await add.getByLabel('Lane from').fill('MYPEN');
	await add.getByLabel('Lane to').fill(to);
	await add.getByLabel('Currency of the rates').selectOption('USD');
	await add.getByLabel('Transit days').fill('3');
	await add.getByLabel('Distance in km (optional)').fill('1180');
	await add.getByLabel('Minimum charge').fill('60');
	await add.getByLabel('Valid from').fill('2026-01-01');
	await add.getByLabel('Source note').fill('E2E road quote RQ-7');
	// The rate is missing: the field says so and nothing is saved.
	await add.getByRole('button', { name: 'Add rate card' }).click();
	await expect(add.getByText('Rate: a number with a dot')).toBeVisible();
	await add.getByLabel('Rate', { exact: true }).fill('0.42');
	await add.getByRole('button', { name: 'Add rate card' }).click();

	await expect(page.getByRole('heading', { name: `MYPEN → ${to} · Road` })).toBeVisible();
	await expect(page.getByText('Rate card added.')).toBeVisible();
	const edit = page.getByRole('region', { name: 'Edit' });
	await edit.getByLabel('Rate', { exact: true }).fill('0.45');
	await edit.getByRole('button', { name: 'Add to surcharges' }).click();
	const fuel = edit.getByRole('group', { name: 'Surcharges 1' });
	await fuel.getByLabel('Charge', { exact: true }).fill('Fuel surcharge');
	await fuel.getByLabel('Charged').selectOption('per_chargeable_kg');
	await fuel.getByLabel('Amount').fill('0.04');
	await edit.getByRole('button', { name: 'Save rate card' }).click();
	await expect(edit.getByRole('status')).toHaveText('Rate card saved.');

	await page.reload();
	await expect(edit.getByLabel('Rate', { exact: true })).toHaveValue('0.45');
	await expect(fuel.getByLabel('Charge', { exact: true })).toHaveValue('Fuel surcharge');
	await gotoHydrated(page, `/reference/rate-cards?lane=MYPEN-${to}`);
	const row = page.getByRole('row', { name: new RegExp(`MYPEN → ${to}`) });
	await expect(row).toContainText('0.45 per kg (min 60)');
	await expect(row).toContainText('+ 1 charge');
});

test('finance adds a customs fee for a country and edits it', async ({ page }) => {
	test.setTimeout(60_000);
	const code = `US-E2E${letters()}`;
	await signInPage(page, DEMO.finance);
	await gotoHydrated(page, '/reference/country-rules?country=US');
	await expect(page.getByText('WTO Customs Valuation Agreement, Art. 8.2').first()).toBeVisible();

	const add = page.getByRole('region', { name: 'Add a customs fee' });
	await expect(add.getByLabel('Country')).toHaveValue('US');
	await add.getByLabel('Code').fill(code);
	await add.getByLabel('Name').fill('E2E inspection fee');
	await add.getByLabel('Charged as').selectOption('fixed');
	await add.getByLabel('Amount (customs currency)').fill('12.50');
	await add.getByLabel('Sea, full container').check();
	await add.getByLabel('Valid from').fill('2026-01-01');
	await add.getByLabel('Source note').fill('E2E fee notice 2026');
	await add.getByRole('button', { name: 'Add customs fee' }).click();

	await expect(page.getByRole('heading', { name: `${code} · E2E inspection fee` })).toBeVisible();
	await expect(page.getByText('Customs fee added.')).toBeVisible();
	const edit = page.getByRole('region', { name: 'Edit' });
	await edit.getByLabel('Amount (customs currency)').fill('13.75');
	await edit.getByRole('button', { name: 'Save customs fee' }).click();
	await expect(edit.getByRole('status')).toHaveText('Customs fee saved.');

	await gotoHydrated(page, '/reference/country-rules?country=US');
	const fees = page.getByRole('region', { name: 'Customs fees' });
	await expect(fees.getByRole('row', { name: new RegExp(code) })).toContainText(
		'13.75 fixed · Sea, full container'
	);
});

test('a coordinator reads the rate cards and country rules but is refused changes', async ({
	page,
	baseURL
}) => {
	await signInPage(page, DEMO.coordinator);
	await gotoHydrated(page, '/reference/rate-cards');
	await expect(page.getByRole('heading', { name: 'Rate cards', level: 1 })).toBeVisible();
	await expect(page.getByRole('button', { name: 'Add rate card' })).toHaveCount(0);
	await gotoHydrated(page, '/reference/country-rules');
	await expect(page.getByRole('button', { name: 'Add customs fee' })).toHaveCount(0);
	await gotoHydrated(page, '/reference/settings');
	await expect(page.getByRole('button', { name: 'Save settings' })).toHaveCount(0);

	const coordinator = await apiAs(baseURL!, DEMO.coordinator);
	for (const path of ['/reference/rate-cards', '/reference/country-rules?/addFee']) {
		const response = await coordinator.post(path, {
			form: { code: 'US-NOPE', laneFrom: 'MY' },
			headers: { accept: 'text/html' },
			maxRedirects: 0
		});
		expect(response.status(), path).toBe(403);
	}
	await coordinator.dispose();
});
