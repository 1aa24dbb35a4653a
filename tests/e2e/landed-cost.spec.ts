import { expect, test } from '@playwright/test';
import { DEMO, apiAs, gotoHydrated, signInPage } from './helpers';

// Finance compares the modes of the seeded Hallvik shipment (Port Klang → Hamburg: sea full
// container, sea groupage, air) and reads how the figures were reached.

test('finance compares air and sea and sees the breakdown and the chart', async ({
	page,
	baseURL
}) => {
	test.setTimeout(90_000);
	const api = await apiAs(baseURL!, DEMO.broker);
	const list = await (await api.get('/api/v1/shipments?pageSize=100')).json();
	const ship = list.rows.find((r: { customerName: string }) =>
		r.customerName.startsWith('Hallvik')
	);
	await api.dispose();

	await signInPage(page, DEMO.finance);
	await gotoHydrated(page, `/shipments/${ship.id}`);
	await page.getByRole('link', { name: 'Compare landed cost by mode' }).click();
	const table = page.getByRole('table', { name: 'Landed cost by mode' });
	// Full-container freight needs the load plan, which the first request computes.
	await expect(table.getByRole('columnheader', { name: /Sea, full container/ })).toBeVisible({
		timeout: 45_000
	});
	await expect(table.getByRole('columnheader', { name: /Air/ })).toBeVisible();
	await expect(table.getByRole('columnheader', { name: /Sea, groupage/ })).toBeVisible();
	await expect(table.getByText('cheapest')).toHaveCount(1);
	await expect(table.getByText('fastest')).toHaveCount(1);
	await expect(page.getByTestId('total-air')).toHaveText(/^\d{1,3}(,\d{3})*\.\d{2}$/);
	const chart = page.getByRole('figure', { name: 'Costs besides the goods, by mode' });
	await expect(chart).toBeVisible();
	// layerchart draws one stacked bar per mode and component, with a legend of the components.
	await expect(chart.locator('svg rect').first()).toBeVisible();
	await expect(chart).toContainText('Freight');
	await expect(chart).toContainText('Import VAT / GST');

	const steps = page.getByRole('list', { name: 'Calculation steps' });
	await expect(steps.getByRole('listitem').first()).toBeVisible();
	await expect(steps).toContainText('Source:');
	await expect(page.getByRole('table', { name: 'Landed cost per line' })).toContainText(
		'SLV-PBL-20'
	);
	await expect(page.getByRole('note')).toContainText('not a customs ruling');

	// Changing an assumption recomputes in the page.
	const before = await page.getByTestId('total-air').textContent();
	await page.getByLabel('Share freight and insurance by').selectOption('weight');
	await page.getByLabel('Cost of money in transit (% a year)').fill('12');
	// Germany values on a CIF basis: each line's customs value takes its share of the freight, and
	// the lines pay different duty rates, so sharing by weight changes the duty and the total.
	await expect(page.getByTestId('total-air')).not.toHaveText(before!);

	const [csv] = await Promise.all([
		page.waitForEvent('download'),
		page.getByRole('button', { name: 'Export CSV' }).click()
	]);
	expect(csv.suggestedFilename()).toMatch(/^SHP-\d{4}-\d{5}-landed-cost-\d{4}-\d{2}-\d{2}\.csv$/);

	// Saved as a scenario, the figures stay as they were, with their data rows.
	const total = await page.getByTestId('total-air').textContent();
	await page.getByLabel('Name', { exact: true }).fill('Air vs sea, first look');
	await page.getByRole('button', { name: 'Save this comparison' }).click();
	await expect(page.getByText('Saved “Air vs sea, first look”')).toBeVisible({ timeout: 30_000 });
	await page
		.getByRole('list', { name: 'Scenarios' })
		.getByRole('link', { name: 'Air vs sea, first look' })
		.click();
	await expect(
		page.getByRole('heading', { level: 1, name: 'Air vs sea, first look' })
	).toBeVisible();
	await expect(page.getByTestId('total-air')).toHaveText(total!);
});
