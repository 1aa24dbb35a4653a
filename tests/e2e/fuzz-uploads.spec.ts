import { createHash } from 'node:crypto';
import { request as httpRequest } from 'node:http';
import { crc32, deflateSync } from 'node:zlib';
import { expect, test, type APIRequestContext } from '@playwright/test';
import * as devalue from 'devalue';
import { DatabaseFingerprint, changedTables } from './db-fingerprint';
import { freshShipment, shipmentJson, type ShipmentJson } from './fuzz-fixtures';
import { DEMO, apiAs, signInPage } from './helpers';
import { region } from './shipment-steps';

// Hostile uploads, beyond supporting-documents.spec.ts (wrong type by content through the
// form, a path in the name, a body over the limit by Content-Length) and the integration test
// (executables named .pdf, 11 MB, paths): an empty file, archives, markup and a PDF header
// further in, a body streamed past the limit without Content-Length, names with control and
// bidi characters, and the lots CSV import (read in the browser, sent as rows). Every refusal
// leaves the database as it was.
//
// No archive is accepted as an upload (uploads/file-check.ts takes PDF, PNG and JPEG by their
// first bytes), and PNG and PDF files are stored as sent, never decoded or unpacked on upload,
// so a decompression bomb has nothing to expand: the last test stores one and gets its exact
// bytes back.

const PDF = Buffer.from(
	'%PDF-1.4\n1 0 obj<</Type/Catalog>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n'
);
const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

/** A PNG chunk: length, type, data, CRC-32 (W3C PNG, 5.3 "Chunk layout"). */
function chunk(type: string, data: Buffer): Buffer {
	const head = Buffer.alloc(4);
	head.writeUInt32BE(data.length);
	const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
	const crc = Buffer.alloc(4);
	crc.writeUInt32BE(crc32(body));
	return Buffer.concat([head, body, crc]);
}

/** A PNG that claims 100,000 × 100,000 RGBA pixels (40 GB decoded) in a few kilobytes. */
function pngBomb(): Buffer {
	const ihdr = Buffer.alloc(13);
	ihdr.writeUInt32BE(100_000, 0);
	ihdr.writeUInt32BE(100_000, 4);
	ihdr.set([8, 6, 0, 0, 0], 8); // 8 bits, RGBA, deflate, no filter, no interlace
	const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
	const idat = deflateSync(Buffer.alloc(4 * 1024 * 1024), { level: 9 });
	return Buffer.concat([
		signature,
		chunk('IHDR', ihdr),
		chunk('IDAT', idat),
		chunk('IEND', Buffer.alloc(0))
	]);
}

const ACTION_HEADERS = { 'x-sveltekit-action': 'true', accept: 'application/json' };

test.describe('hostile uploads', () => {
	let coordinator: APIRequestContext;
	let ship: ShipmentJson;
	const db = new DatabaseFingerprint();

	test.beforeAll(async ({ baseURL }) => {
		coordinator = await apiAs(baseURL!, DEMO.coordinator);
		const admin = await apiAs(baseURL!, DEMO.admin);
		const { rows } = (await (
			await admin.get('/api/v1/shipments?pageSize=200&sort=created&dir=asc')
		).json()) as { rows: { id: string; customerName: string }[] };
		const hallvik = rows.find((r) => r.customerName.startsWith('Hallvik'))!;
		ship = await freshShipment(admin, await shipmentJson(admin, hallvik.id));
		await admin.dispose();
		await db.open();
	});

	test.afterAll(async () => {
		await db.close();
		await coordinator.dispose();
	});

	const upload = (name: string, buffer: Buffer) =>
		coordinator.post(`/shipments/${ship.id}?/uploadSupporting`, {
			headers: ACTION_HEADERS,
			multipart: {
				__superform_id: 'supporting-upload',
				kind: 'other',
				title: `Hostile upload ${sha256(Buffer.from(name)).slice(0, 12)}`,
				file: { name, mimeType: 'application/pdf', buffer }
			}
		});

	const listed = async () =>
		(
			(await (
				await coordinator.get(`/api/v1/shipments/${ship.id}/supporting-documents`)
			).json()) as { documents: { id: string; fileName: string; sha256: string }[] }
		).documents;

	test('refuses empty files, archives and markup on the file field, storing nothing', async () => {
		const cases: [string, Buffer, RegExp][] = [
			['empty.pdf', Buffer.alloc(0), /empty|Choose a PDF, PNG or JPEG file/],
			[
				'report.pdf',
				Buffer.from('PK\u0003\u0004\u0014\u0000\u0000\u0000'),
				/Only PDF, PNG or JPEG/
			],
			['bomb.pdf', Buffer.from([0x1f, 0x8b, 0x08, 0, 0, 0, 0, 0]), /Only PDF, PNG or JPEG/],
			['page.pdf', Buffer.from('<html><script>window.__pwned=1</script>'), /Only PDF/],
			['logo.png', Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" onload="x()"/>'), /Only/],
			['late.pdf', Buffer.from('<html>\n%PDF-1.4\n'), /Only PDF, PNG or JPEG/]
		];
		const before = await db.take();
		for (const [name, bytes, message] of cases) {
			const response = await upload(name, bytes);
			expect(response.status(), name).toBe(200);
			const result = (await response.json()) as { type: string; status: number; data: string };
			expect(result, name).toMatchObject({ type: 'failure', status: 400 });
			const { form } = devalue.parse(result.data) as { form: { errors: { file?: string[] } } };
			expect(form.errors.file?.join(' '), name).toMatch(message);
		}
		expect(changedTables(before, await db.take())).toEqual([]);
	});

	test('refuses a body streamed past the limit without Content-Length: 413 on the file', async ({
		baseURL
	}) => {
		const boundary = 'landfall-stream';
		const head = Buffer.from(
			`--${boundary}\r\nContent-Disposition: form-data; name="__superform_id"\r\n\r\nsupporting-upload\r\n` +
				`--${boundary}\r\nContent-Disposition: form-data; name="kind"\r\n\r\nother\r\n` +
				`--${boundary}\r\nContent-Disposition: form-data; name="title"\r\n\r\nStreamed\r\n` +
				`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="big.pdf"\r\n` +
				'Content-Type: application/pdf\r\n\r\n'
		);
		const { cookies } = await coordinator.storageState();
		const url = new URL(`/shipments/${ship.id}?/uploadSupporting`, baseURL);
		const before = await db.take();
		const answer = await new Promise<{ status: number; body: string }>((resolve, reject) => {
			const req = httpRequest(
				url,
				{
					method: 'POST',
					headers: {
						...ACTION_HEADERS,
						origin: baseURL!,
						cookie: cookies.map((c) => `${c.name}=${c.value}`).join('; '),
						'content-type': `multipart/form-data; boundary=${boundary}`,
						'transfer-encoding': 'chunked'
					}
				},
				(res) => {
					let body = '';
					res.setEncoding('utf8');
					res.on('data', (d: string) => (body += d));
					res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
				}
			);
			// The server may answer (and close) before the whole body is sent.
			req.on('error', (e) => (e.message.includes('EPIPE') ? undefined : reject(e)));
			req.write(head);
			req.write(PDF);
			const megabyte = Buffer.alloc(1024 * 1024, 0x20);
			for (let i = 0; i < 12; i++) req.write(megabyte);
			req.end(`\r\n--${boundary}--\r\n`);
		});
		expect(answer.status, answer.body).toBeLessThan(500);
		const result = JSON.parse(answer.body) as { type: string; status: number; data: string };
		expect(result).toMatchObject({ type: 'failure', status: 413 });
		expect(result.data).toContain('The file is over 10 MB; at most 10 MB is accepted.');
		expect(changedTables(before, await db.take())).toEqual([]);
	});

	test('cleans hostile file names and keeps the bytes', async () => {
		const names = [
			'..\\..\\windows\\system32\\evil.pdf',
			'/etc/cron.d/job.pdf',
			'invoice\u202Efdp.exe',
			'nul\u0000byte.pdf',
			'<script>alert(1)</script>.pdf',
			`${'long'.repeat(100)}.pdf`,
			'CON.pdf'
		];
		for (const name of names) {
			const result = (await (await upload(name, PDF)).json()) as { type: string };
			expect(result.type, name).toBe('success');
		}
		const stored = (await listed()).slice(0, names.length);
		for (const doc of stored) {
			// eslint-disable-next-line no-control-regex -- no control character may remain
			expect(doc.fileName).not.toMatch(/[/\\<>\u0000-\u001f\u202a-\u202e]/);
			expect(doc.fileName.length).toBeLessThanOrEqual(120);
			expect(doc.fileName).toMatch(/\.pdf$/);
			expect(doc.sha256).toBe(sha256(PDF));
		}
	});

	test('stores a PNG decompression bomb as sent, without decoding it', async () => {
		const bomb = pngBomb();
		expect(bomb.length).toBeLessThan(64 * 1024);
		const started = Date.now();
		const result = (await (await upload('bomb.png', bomb)).json()) as { type: string };
		expect(result.type).toBe('success');
		// Decoding 40 GB of pixels would take far longer than this, or run out of memory.
		expect(Date.now() - started).toBeLessThan(10_000);
		const doc = (await listed()).find((d) => d.sha256 === sha256(bomb));
		expect(doc?.fileName).toBe('bomb.png');
		const download = await coordinator.get(`/shipments/${ship.id}/supporting/${doc!.id}`);
		expect(download.headers()['content-type']).toBe('image/png');
		expect(sha256(await download.body())).toBe(sha256(bomb));
	});

	test('the lots import refuses too many rows, an oversize body and hostile rows', async () => {
		const lot = (n: number, lotNumber = `FZ-${n}`) => ({
			productId: ship.lines[0]!.productId,
			cartonFrom: 1,
			cartonTo: 1,
			lotNumber,
			serialFrom: '',
			serialTo: ''
		});
		const post = (lots: unknown[]) =>
			coordinator.post(`/shipments/${ship.id}?/importLots`, {
				headers: ACTION_HEADERS,
				form: {
					__superform_id: 'lot-import',
					__superform_json: devalue.stringify({ lots, version: ship.version })
				}
			});
		const before = await db.take();
		const many = await post(Array.from({ length: 501 }, (_, i) => lot(i)));
		expect(await many.text()).toContain('At most 500 lots per file.');
		// 12 MB of rows (each different: devalue would send a repeated string once), past
		// BODY_SIZE_LIMIT (11M): refused with a message, never a 500.
		const huge = await post(
			Array.from({ length: 300 }, (_, i) => lot(i, String(i).padEnd(40_000, 'x')))
		);
		expect(huge.status()).toBeLessThan(500);
		expect(await huge.text()).toContain('The form is too large to send.');
		const nul = await post([lot(1, 'LOT\u0000A')]);
		expect(await nul.text()).toContain('NUL');
		expect(changedTables(before, await db.take())).toEqual([]);
	});

	test('the lots CSV over 1 MB is refused in the browser before anything is sent', async ({
		page
	}) => {
		await signInPage(page, DEMO.coordinator);
		await page.goto(`/shipments/${ship.id}`);
		const lots = region(page, 'Lots and serial numbers');
		await lots.getByText('Add lots from a CSV file').click();
		const posts: string[] = [];
		page.on('request', (r) => {
			if (r.method() === 'POST' && r.url().includes('?/')) posts.push(r.url());
		});
		const header = 'sku,carton_from,carton_to,lot\n';
		const row = 'SLV-PBL-20,1,1,LOT-A\n';
		await lots.getByLabel('Lots CSV file').setInputFiles({
			name: 'lots.csv',
			mimeType: 'text/csv',
			buffer: Buffer.from(header + row.repeat(Math.ceil(1_100_000 / row.length)))
		});
		await expect(
			lots.getByText('That file is larger than 1 MB; split it into smaller files.')
		).toBeVisible();
		expect(posts).toEqual([]);
	});
});
