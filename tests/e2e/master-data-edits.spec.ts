import { expect, test } from '@playwright/test';
import { DEMO, signInPage } from './helpers';

// A coordinator corrects a place and a container type; a bad figure gets a field error and
// keeps what was typed; a place a shipment names cannot be removed, only retired.

test('a coordinator edits a place and a container type', async ({ page }) => {
	await signInPage(page, DEMO.coordinator);
	await page.goto('/places');
	await page.getByRole('link', { name: 'AUMEL' }).click();
	await expect(page.getByRole('heading', { name: /^AUMEL/ })).toBeVisible();
	await expect(page.getByText('It cannot be removed while shipments name it')).toBeVisible();
	await expect(page.getByRole('button', { name: 'Remove for good' })).toHaveCount(0);
	await page.getByLabel('Name').fill('');
	await page.getByRole('button', { name: 'Save place' }).click();
	await expect(page.getByText('Enter the name.')).toBeVisible();
	await page.getByLabel('Name').fill('Melbourne (Port of Melbourne)');
	await page.getByRole('button', { name: 'Save place' }).click();
	await expect(page.getByRole('status').filter({ hasText: 'Saved.' })).toBeVisible();
	await page.reload();
	await expect(page.getByLabel('Name')).toHaveValue('Melbourne (Port of Melbourne)');

	await page.getByRole('link', { name: 'Pallets & containers' }).click();
	await page.getByRole('link', { name: 'C40HC' }).click();
	await expect(page.getByLabel('Code', { exact: true })).toHaveAttribute('readonly', '');
	await page.getByLabel('Door opening height (mm)').fill('2800');
	await page.getByRole('button', { name: 'Save container type' }).click();
	await expect(page.getByText('The door opening cannot be higher than the inside')).toBeVisible();
	await expect(page.getByLabel('Door opening height (mm)')).toHaveValue('2800');
	await page.getByLabel('Door opening height (mm)').fill('2585');
	await page.getByLabel('Tare (kg)').fill('3900');
	await expect(page.getByText('26580', { exact: true })).toBeVisible();
	await page.getByRole('button', { name: 'Save container type' }).click();
	await expect(page.getByRole('status').filter({ hasText: 'Saved.' })).toBeVisible();
	await page.reload();
	await expect(page.getByText('Changed in Landfall; the data file has 3940 kg')).toBeVisible();
});
