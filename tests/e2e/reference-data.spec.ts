import { expect, test } from '@playwright/test';
import { DEMO, gotoHydrated, signInPage } from './helpers';

// Finance keeps the landed-cost reference data: a daily rate table imported from a CSV file,
// previewed row by row, recorded all at once and listed with its source.

test('finance imports a small FX table and sees the rates listed', async ({ page }) => {
	test.setTimeout(60_000);
	await signInPage(page, DEMO.finance);
	await page.getByRole('link', { name: 'Landed-cost data' }).click();
	await expect(page.getByRole('heading', { name: 'Exchange rates', level: 1 })).toBeVisible();

	const importer = page.getByRole('region', { name: 'Import a daily rate table' });
	await importer.getByLabel('Source note').fill('E2E reference table, 2031-03');
	const file = (csv: string) => ({
		name: 'rates.csv',
		mimeType: 'text/csv',
		buffer: Buffer.from(csv)
	});
	// One column per currency needs the base: the preview says so until it is chosen.
	await importer
		.getByLabel('Rate table (CSV)')
		.setInputFiles(file('date,EUR,JPY\n2031-03-02,0.9111,150.5\n2031-03-03,0.9122,N/A\n'));
	await expect(importer.getByRole('alert')).toContainText('choose the base currency');
	await importer.getByLabel(/Base currency/).selectOption('USD');
	await expect(importer.getByText('3 rates in 2 rows.')).toBeVisible();
	await importer.getByRole('button', { name: 'Import 3 rates' }).click();
	await expect(importer.getByRole('status')).toHaveText('3 rates imported.');

	const list = page.getByRole('region', { name: 'Rates' });
	await page.getByLabel('Pair').selectOption('USD-JPY');
	await expect(page).toHaveURL(/pair=USD-JPY/);
	const row = list.getByRole('row', { name: /2031-03-02/ });
	await expect(row).toContainText('USD/JPY');
	await expect(row).toContainText('150.5');
	await expect(row).toContainText('E2E reference table, 2031-03');

	// A file with a rate that exists already is refused as a whole, naming that rate.
	await importer.getByLabel('Source note').fill('E2E reference table, 2031-03');
	await importer
		.getByLabel('Rate table (CSV)')
		.setInputFiles(file('date,base,quote,rate\n2031-03-04,USD,EUR,0.9\n2031-03-02,USD,EUR,0.9\n'));
	await importer.getByRole('button', { name: 'Import 2 rates' }).click();
	await expect(importer.getByRole('alert')).toContainText('USD/EUR 2031-03-02');
});

test('a coordinator reads the rates but has no forms', async ({ page }) => {
	await signInPage(page, DEMO.coordinator);
	await gotoHydrated(page, '/reference/exchange-rates');
	await expect(page.getByRole('heading', { name: 'Exchange rates', level: 1 })).toBeVisible();
	await expect(page.getByRole('button', { name: 'Add rate' })).toHaveCount(0);
});

test('finance adds a tariff row, edits its duty and ends its validity', async ({ page }) => {
	test.setTimeout(60_000);
	const prefix = `8504${String(Math.floor(Math.random() * 1e4)).padStart(4, '0')}`;
	await signInPage(page, DEMO.finance);
	await gotoHydrated(page, '/reference/tariffs');
	const add = page.getByRole('region', { name: 'Add a tariff row' });
	await add.getByLabel('Destination country').selectOption('AU');
	await add.getByLabel('HS prefix').fill(prefix);
	await add.getByLabel('Duty', { exact: true }).selectOption('compound');
	await add.getByLabel('Duty rate (%)').fill('3');
	await add.getByLabel('Duty amount').fill('0.25');
	await add.getByLabel('Per', { exact: true }).selectOption('kg');
	await add.getByLabel('Currency of the amount').selectOption('AUD');
	await add.getByLabel('Valid from').fill('2026-01-01');
	// Without a source note the row is refused on that field.
	await add.getByRole('button', { name: 'Add tariff row' }).click();
	await expect(add.getByText('Say where the figures come from')).toBeVisible();
	await add.getByLabel('Source note').fill('E2E schedule, heading 8504');
	await add.getByRole('button', { name: 'Add tariff row' }).click();

	await expect(page.getByRole('heading', { name: `AU · HS ${prefix}` })).toBeVisible();
	await expect(page.getByText('Tariff row added.')).toBeVisible();
	const edit = page.getByRole('region', { name: 'Edit' });
	await expect(edit.getByLabel('Duty amount')).toHaveValue('0.25');
	await edit.getByLabel('Duty', { exact: true }).selectOption('ad_valorem');
	await expect(edit.getByLabel('Duty amount')).toHaveCount(0);
	await edit.getByLabel('Duty rate (%)').fill('2.5');
	await edit.getByRole('button', { name: 'Save tariff row' }).click();
	await expect(edit.getByRole('status')).toHaveText('Tariff row saved.');

	const retire = page.getByRole('region', { name: 'End validity' });
	await expect(retire).toContainText('2.5 %');
	await retire.getByLabel('Last valid day').fill('2026-12-31');
	await retire.getByRole('button', { name: 'Retire from that day' }).click();
	await expect(retire.getByRole('status')).toHaveText('Valid until 2026-12-31.');

	await gotoHydrated(page, `/reference/tariffs?destination=AU`);
	const row = page.getByRole('row', { name: new RegExp(prefix) });
	await expect(row).toContainText('2.5 %');
	await expect(row).toContainText('2026-01-01 – 2026-12-31');
});
