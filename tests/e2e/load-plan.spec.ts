import { expect, test, type Page } from '@playwright/test';
import { DEMO, gotoHydrated, signInPage } from './helpers';

// A coordinator computes a shipment's container load plan in the browser: progress, the figures,
// the 3D, side and top views, the viewpoints and the loading sequence; the plan then comes from
// the cache. The demo shipment for Cedarpoint is 240 power-bank and 20 battery-pack cartons.

async function openCedarpointShipment(page: Page) {
	await gotoHydrated(page, '/shipments?q=SHP-2026-00003'); // Cedarpoint's; other specs add shipments
	await page
		.getByRole('row', { name: /Cedarpoint/ })
		.first()
		.getByRole('link', { name: /^SHP-/ })
		.click();
	await expect(page.getByRole('heading', { name: /^SHP-/ })).toBeVisible();
	return page.getByRole('region', { name: 'Container load plan' });
}

test('a coordinator computes the load plan and sees the 3D view and utilisation', async ({
	page
}) => {
	test.setTimeout(60_000);
	await signInPage(page, DEMO.coordinator);
	const panel = await openCedarpointShipment(page);
	await panel.getByRole('button', { name: /^Compute/ }).click();
	await expect(panel.getByTestId('load-plan-summary')).toContainText(/\d+ × .*container/, {
		timeout: 30_000
	});
	await expect(
		panel.getByRole('img', { name: /^Three-dimensional view of container 1/ })
	).toBeVisible();
	await expect(panel.getByRole('img', { name: /^Side view/ })).toBeVisible();
	await expect(panel.getByRole('img', { name: /^Top view/ })).toBeVisible();
	await expect(panel.getByTestId('volume-utilisation')).toHaveText(/^\d+\.\d %$/);
	await expect(panel.getByTestId('payload-utilisation')).toHaveText(/^\d+\.\d %$/);
	await expect(panel.getByRole('list', { name: 'Products in this container' })).toContainText(
		'SLV-PBL-20'
	);
	await expect(
		panel.getByText('decide securing, weight distribution', { exact: false })
	).toBeVisible();

	await panel.getByLabel('Front wall, left side').check();
	await expect(panel.getByRole('img', { name: /front wall, left side$/ })).toBeVisible();
	const step = panel.getByTestId('load-plan-step');
	const all = Number((await step.textContent())!.match(/of (\d+)/)![1]);
	await panel.getByRole('button', { name: 'Previous' }).click();
	await expect(step).toContainText(`Step ${all - 1} of ${all}: `);
	await expect(step).toContainText(/ at x \d+, y \d+, z \d+ mm$/);

	// The plan is kept for this revision: a reload shows it without computing again.
	await page.reload();
	await expect(panel.getByTestId('volume-utilisation')).toBeVisible();
	await expect(panel.getByRole('button', { name: 'Compute again' })).toBeVisible();
});
