import { expect, test } from '@playwright/test';
import { DEMO, signInPage } from './helpers';

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
	await page.goto('/reference/exchange-rates');
	await expect(page.getByRole('heading', { name: 'Exchange rates', level: 1 })).toBeVisible();
	await expect(page.getByRole('button', { name: 'Add rate' })).toHaveCount(0);
});
