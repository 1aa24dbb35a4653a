import { expect, test, type Page } from '@playwright/test';
import { DEMO, signInPage } from './helpers';
import {
	PEBBLE,
	addLine,
	createDraftShipment,
	linesRegion,
	region,
	saveLines
} from './shipment-steps';

// A coordinator records lots for recalls: typed, and from a CSV file previewed row by row and
// recorded all at once; then traces a serial number back to the shipment and its cartons.

const lotsRegion = (page: Page) => region(page, 'Lots and serial numbers');

test('lots from a CSV file are previewed, recorded together, and traced', async ({ page }) => {
	test.setTimeout(60_000);
	await signInPage(page, DEMO.coordinator);
	const { reference } = await createDraftShipment(page);
	// 250 Pebble speakers: 20 full cartons of 12 and one of 10, cartons 1–21.
	await addLine(page, 1, PEBBLE, '250');
	await saveLines(page);
	await expect(linesRegion(page).getByRole('status')).toHaveText('1 line(s) saved.');

	const lots = lotsRegion(page);
	await lots.getByText('Add lots from a CSV file').click();
	await lots.getByLabel('Lots CSV file').setInputFiles({
		name: 'lots.csv',
		mimeType: 'text/csv',
		buffer: Buffer.from(
			'sku,carton_from,carton_to,lot,serial_from,serial_to\n' +
				'SLV-PBL-20,1,10,E2E-LOT-A,E2E9-000001,E2E9-000120\n' +
				'SLV-PBL-20,11,21,E2E-LOT-B,E2E9-000121,E2E9-000250\n' +
				'SLV-NOPE,1,2,E2E-LOT-C,,\n'
		)
	});
	const preview = lots.getByRole('table').filter({ hasText: 'rows can be recorded' });
	await expect(preview.getByText('2 of 3 rows can be recorded.')).toBeVisible();
	await expect(preview.getByRole('row', { name: /SLV-NOPE/ })).toContainText(
		'No product with SKU “SLV-NOPE” on this shipment.'
	);
	await lots.getByRole('button', { name: 'Record 2 lots' }).click();
	await expect(lots.getByRole('status')).toHaveText('2 lots recorded.');
	const recorded = lots.getByRole('table').first();
	await expect(recorded.getByRole('row', { name: /E2E-LOT-A/ })).toContainText('1–10');
	await expect(recorded.getByRole('row', { name: /E2E-LOT-B/ })).toContainText('11–21');

	// A range outside the product's cartons is refused, and nothing of that file is recorded.
	await lots.getByLabel('Lots CSV file').setInputFiles({
		name: 'more.csv',
		mimeType: 'text/csv',
		buffer: Buffer.from(
			'sku,carton_from,carton_to,lot\nSLV-PBL-20,1,2,E2E-LOT-D\nSLV-PBL-20,20,30,E2E-LOT-E\n'
		)
	});
	await lots.getByRole('button', { name: 'Record 2 lots' }).click();
	await expect(lots.getByRole('alert')).toContainText(
		'row 3 (lot E2E-LOT-E): This product is in cartons 1–21.'
	);
	await expect(recorded.getByRole('row', { name: /E2E-LOT-D/ })).toHaveCount(0);

	await page.goto('/trace?q=E2E9-000200');
	const hit = page.getByRole('row', { name: new RegExp(reference) });
	await expect(hit).toContainText('E2E-LOT-B');
	await expect(hit).toContainText('11–21');
});
