import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { expect, test } from '@playwright/test';
import { apiAs, DEMO, signInPage } from './helpers';
import { region } from './shipment-steps';

// Supporting documents on a shipment: a coordinator uploads a PDF, sees it listed and downloads
// it (the same bytes, as an attachment under the cleaned name, logged); a file that is no PDF,
// PNG or JPEG by content is refused on the file field, whatever its name; a body over the limit
// is a 413 with that field's error, not a 500; the shipment's customer sees the document and
// another customer gets a 404. Uses the seeded draft SHP-2026-00002 (Wattlebird): an empty draft
// of its own would be the newest shipment, which other specs open first and expect lines in.

/** A small PDF: the server checks the magic bytes, not a full parse. */
const PDF = Buffer.from(
	'%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[]/Count 0>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n'
);
const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

test('a coordinator uploads a PDF on a shipment, sees it listed and downloads it', async ({
	page,
	baseURL
}) => {
	test.setTimeout(90_000);
	await signInPage(page, DEMO.coordinator);
	await page.goto('/shipments?q=SHP-2026-00002'); // other specs add shipments to the list
	await page.getByRole('link', { name: 'SHP-2026-00002' }).click();
	await expect(page).toHaveURL(/\/shipments\/[0-9a-f-]{36}$/);
	const shipmentId = page.url().split('/').pop()!;
	const title = `Certificate of origin, chamber copy ${Date.now()}`;
	const docs = region(page, 'Supporting documents');

	// Wrong type by content: a Windows executable named .pdf and declared as a PDF.
	await docs.getByLabel('Kind').selectOption({ label: 'Proof of origin' });
	await docs.getByLabel('Title').fill(title);
	await docs.getByLabel('File', { exact: true }).setInputFiles({
		name: 'certificate.pdf',
		mimeType: 'application/pdf',
		buffer: Buffer.from([0x4d, 0x5a, 0x90, 0x00, 0x03, 0x00, 0x00, 0x00])
	});
	await docs.getByRole('button', { name: 'Add the document' }).click();
	const file = docs.getByLabel('File', { exact: true });
	await expect(docs.getByRole('alert')).toHaveText('The file was not added: see the file field.');
	await expect(file).toHaveAttribute('aria-invalid', 'true');
	await expect(file).toHaveAccessibleDescription(
		/Only PDF, PNG or JPEG files are accepted, and this file is none of them\./
	);
	await expect(docs.getByText(title)).toHaveCount(0);

	// The real PDF, with a path in its name.
	await docs.getByLabel('Title').fill(title);
	await docs.getByLabel('Valid until (optional)').fill('2030-12-31');
	await file.setInputFiles({
		name: '../../etc/certificate of origin.pdf',
		mimeType: 'application/octet-stream',
		buffer: PDF
	});
	await docs.getByRole('button', { name: 'Add the document' }).click();
	await expect(
		docs.getByText('Added certificate of origin.pdf to the documents on file.')
	).toBeVisible();
	const table = docs.getByRole('table', { name: 'Supporting documents on file' });
	const row = table.getByRole('row', { name: new RegExp(title) });
	await expect(row).toContainText('Proof of origin');
	await expect(row).toContainText('2030-12-31');

	const [download] = await Promise.all([
		page.waitForEvent('download'),
		row.getByRole('link', { name: /certificate of origin\.pdf/ }).click()
	]);
	expect(download.suggestedFilename()).toBe('certificate of origin.pdf');
	const path = await download.path();
	expect(sha256(await readFile(path))).toBe(sha256(PDF));

	// The JSON list (no content), and the download counted there.
	const listed = (await (
		await page.request.get(`/api/v1/shipments/${shipmentId}/supporting-documents`)
	).json()) as {
		documents: { id: string; title: string; fileName: string; downloads: number; sha256: string }[];
	};
	const doc = listed.documents.find((d) => d.title === title);
	expect(doc).toMatchObject({
		fileName: 'certificate of origin.pdf',
		downloads: 1,
		sha256: sha256(PDF)
	});
	expect(doc).not.toHaveProperty('content');

	// Headers of the download route itself.
	const href = `/shipments/${shipmentId}/supporting/${doc!.id}`;
	const response = await page.request.get(href);
	expect(response.status()).toBe(200);
	expect(response.headers()['content-type']).toBe('application/pdf');
	expect(response.headers()['x-content-type-options']).toBe('nosniff');
	expect(response.headers()['content-disposition']).toMatch(
		/^attachment; filename="certificate of origin\.pdf"/
	);

	// The same file through the API, logged as an API download.
	const viaApi = await page.request.get(
		`/api/v1/shipments/${shipmentId}/supporting-documents/${doc!.id}`
	);
	expect(viaApi.status()).toBe(200);
	expect(viaApi.headers()['x-landfall-sha256']).toBe(sha256(PDF));
	expect(sha256(await viaApi.body())).toBe(sha256(PDF));

	// The shipment's customer (Wattlebird) may download it; another customer gets a 404.
	const wattlebird = await apiAs(baseURL!, DEMO.otherCustomer);
	expect((await wattlebird.get(href)).status()).toBe(200);
	const hallvik = await apiAs(baseURL!, DEMO.customer);
	expect((await hallvik.get(href)).status()).toBe(404);
	expect((await hallvik.get(`/api/v1/shipments/${shipmentId}/supporting-documents`)).status()).toBe(
		404
	);

	// A body over the limit is refused with the file field's error (413), never a 500.
	const big = Buffer.alloc(11 * 1024 * 1024);
	PDF.copy(big);
	const tooBig = await page.request.post(`/shipments/${shipmentId}?/uploadSupporting`, {
		headers: { origin: baseURL!, accept: 'application/json', 'x-sveltekit-action': 'true' },
		multipart: {
			__superform_id: 'supporting-upload',
			kind: 'other',
			title: 'Too large',
			file: { name: 'big.pdf', mimeType: 'application/pdf', buffer: big }
		}
	});
	const result = (await tooBig.json()) as { type: string; status: number; data: string };
	expect(result).toMatchObject({ type: 'failure', status: 413 });
	expect(result.data).toContain('The file is over 10 MB; at most 10 MB is accepted.');
	await hallvik.dispose();
	await wattlebird.dispose();
});

test('a file picked over 10 MB is refused before it is sent', async ({ page }) => {
	await signInPage(page, DEMO.coordinator);
	await page.goto('/shipments?q=SHP-2026-00002'); // other specs add shipments to the list
	await page.getByRole('link', { name: 'SHP-2026-00002' }).click();
	const docs = region(page, 'Supporting documents');
	const big = Buffer.alloc(10 * 1024 * 1024 + 1);
	PDF.copy(big);
	await docs
		.getByLabel('File', { exact: true })
		.setInputFiles({ name: 'big.pdf', mimeType: 'application/pdf', buffer: big });
	await expect(docs.getByText('The file is over 10 MB; at most 10 MB is accepted.')).toBeVisible();
});
