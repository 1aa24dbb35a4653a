import { expect, test } from '@playwright/test';
import { DEMO, gotoHydrated, signInPage } from './helpers';
import {
	POWER_BANK,
	addLine,
	createDraftShipment,
	headerRegion,
	linesRegion,
	region,
	saveLines,
	statusRegion
} from './shipment-steps';

// The browser test: a coordinator tries to issue the papers of an air shipment of power
// banks (lithium-ion batteries) without a UN38.3 test summary on file, is stopped with the
// reason, follows it to the product, uploads the summary there, and issues.

/** A small, valid-looking PDF: the server checks the magic bytes, not a full parse. */
const PDF = Buffer.from(
	'%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[]/Count 0>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n'
);

test('papers for power banks by air wait for a UN38.3 summary, then issue', async ({ page }) => {
	test.setTimeout(120_000);
	await signInPage(page, DEMO.coordinator);
	const shipment = await createDraftShipment(page);

	const header = headerRegion(page);
	await header
		.getByLabel('Consignee')
		.selectOption({ label: 'Hallvik Heimtechnik GmbH — Distribution centre (Bremen, DE)' });
	await header.getByRole('checkbox', { name: 'Air', exact: true }).check();
	await header.getByLabel('Chosen mode').selectOption({ label: 'Air' });
	await header.getByRole('button', { name: 'Save shipment' }).click();
	await expect(header.getByRole('status')).toHaveText('Shipment saved.', { timeout: 15_000 });

	await addLine(page, 1, POWER_BANK, '120');
	await saveLines(page);
	await expect(linesRegion(page).getByRole('status')).toBeVisible({ timeout: 15_000 });

	const status = statusRegion(page);
	await status.getByRole('button', { name: 'Mark booked' }).click();
	await expect(status.getByText('Booked', { exact: true }).first()).toBeVisible();

	const papers = region(page, 'Customs papers');
	await papers.getByLabel('Payment terms').fill('30 days net');
	await papers.getByLabel('Reason for export').fill('Sale');
	await papers.getByLabel('Signatory', { exact: true }).fill('Daniel Tan Wei Jie');
	await papers.getByLabel("Signatory's title").fill('Logistics coordinator');
	await papers.getByLabel('Place of signing').fill('Port Klang');
	await papers.getByRole('button', { name: 'Save details for the papers' }).click();
	await expect(papers.getByText('Details for the papers saved.')).toBeVisible({ timeout: 15_000 });

	// Stopped, with the reason, and only that reason.
	const missing = papers.getByRole('list', { name: 'Missing before issue' });
	await expect(missing.getByRole('listitem')).toHaveCount(1);
	await expect(missing).toContainText(
		'SLV-PWR-20K: lithium-ion batteries going by air need a current UN38.3 test summary on file.'
	);
	await expect(papers.getByRole('button', { name: 'Issue papers' })).toBeDisabled();
	await expect(papers.getByRole('table', { name: 'Document register' })).toHaveCount(0);

	// The reason links to the product's documents; the summary is uploaded there.
	await missing.getByRole('link').click();
	await expect(page).toHaveURL(/\/products\/[0-9a-f-]{36}#supporting-documents-heading$/);
	const docs = region(page, 'Supporting documents');
	await docs.getByLabel('Kind').selectOption({ label: 'UN38.3 test summary' });
	await docs.getByLabel('Title').fill('UN38.3 test summary, Ridge 20000 pack, 2026');
	await docs.getByLabel('Valid until (optional)').fill('2029-12-31');
	await docs.getByLabel('File', { exact: true }).setInputFiles({
		name: 'ridge-20k-un38.3.pdf',
		mimeType: 'application/pdf',
		buffer: PDF
	});
	await docs.getByRole('button', { name: 'Add the document' }).click();
	await expect(
		docs.getByText('Added ridge-20k-un38.3.pdf to the documents on file.')
	).toBeVisible();
	await expect(docs.getByRole('table', { name: 'Supporting documents on file' })).toContainText(
		'UN38.3 test summary, Ridge 20000 pack, 2026'
	);

	await gotoHydrated(page, shipment.url);
	const ready = region(page, 'Customs papers');
	await expect(ready.getByRole('list', { name: 'Missing before issue' })).toHaveCount(0);
	await ready.getByRole('button', { name: 'Issue papers' }).click();
	await expect(
		ready.getByText(/^Issued CI-\d{4}-\d{5} rev\. A, PL-\d{4}-\d{5} rev\. A\.$/)
	).toBeVisible({
		timeout: 20_000
	});
});

test('a file that is not a PDF, PNG or JPEG is refused with a field error', async ({ page }) => {
	await signInPage(page, DEMO.coordinator);
	await gotoHydrated(page, '/products');
	await page
		.getByRole('link', { name: /SLV-PWR-20K/ })
		.first()
		.click();
	const docs = region(page, 'Supporting documents');
	await docs.getByLabel('Kind').selectOption({ label: 'Safety data sheet' });
	await docs.getByLabel('Title').fill('Renamed program');
	await docs.getByLabel('File', { exact: true }).setInputFiles({
		name: 'sds.pdf',
		mimeType: 'application/pdf',
		buffer: Buffer.from('MZ\x90\x00\x03\x00\x00\x00 this is a program')
	});
	await docs.getByRole('button', { name: 'Add the document' }).click();
	await expect(
		docs
			.getByText('Only PDF, PNG or JPEG files are accepted, and this file is none of them.')
			.first()
	).toBeVisible();
	await expect(docs.getByRole('cell', { name: /Renamed program/ })).toHaveCount(0);
});
