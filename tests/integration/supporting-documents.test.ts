// Supporting documents: uploads checked by content and size, names cleaned, downloads scoped to
// who may see the shipment or product (404 otherwise) and logged; and the readiness check sees a
// current UN38.3 summary. Works on the seeded Hallvik (broker Kaaiman) and Wattlebird shipments;
// removes what it adds.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import type { SessionUser } from '$lib/server/auth/session-user';
import type { SupportingKind } from '$lib/uploads/document-kinds';
import {
	currentDocumentsOfKind,
	downloadSupportingDocument,
	listSupportingDocuments,
	retireSupportingDocument,
	uploadSupportingDocument
} from '$lib/server/services/supporting-documents';
import { sequelize, sessionUserFor } from './db';

const IP = '127.0.0.1';
const PDF = new TextEncoder().encode('%PDF-1.4\n%%EOF\n');
const added: string[] = [];
let coordinator: SessionUser;
let hallvikBuyer: SessionUser;
let wattlebirdBuyer: SessionUser;
let broker: SessionUser;
let finance: SessionUser;
let hallvikShip: string;
let wattlebirdShip: string;
let powerBank: string;

async function shipmentOf(customer: string): Promise<string> {
	const [row] = await sequelize.query<{ id: string }>(
		`SELECT s.id FROM shipments s JOIN organizations o ON o.id = s.customer_id
		 WHERE o.name LIKE :name AND s.notes LIKE 'Demo scenario:%' ORDER BY s.created_at LIMIT 1`,
		{ replacements: { name: `${customer}%` }, type: QueryTypes.SELECT }
	);
	return row!.id;
}

const upload = (
	user: SessionUser,
	owner: { shipmentId: string } | { productId: string },
	fileName: string,
	bytes: Uint8Array,
	kind: SupportingKind = 'other'
) =>
	uploadSupportingDocument(
		user,
		owner,
		{ kind, title: `itest ${fileName}`, issuedOn: null, expiresOn: null, fileName, bytes },
		IP
	);

beforeAll(async () => {
	coordinator = await sessionUserFor('coordinator@solvrae.example');
	hallvikBuyer = await sessionUserFor('buyer@hallvik.example');
	wattlebirdBuyer = await sessionUserFor('buyer@wattlebird.example');
	broker = await sessionUserFor('broker@kaaiman.example');
	finance = await sessionUserFor('finance@solvrae.example');
	hallvikShip = await shipmentOf('Hallvik');
	wattlebirdShip = await shipmentOf('Wattlebird');
	const [p] = await sequelize.query<{ id: string }>(
		`SELECT id FROM products WHERE sku = 'SLV-PWR-20K'`,
		{ type: QueryTypes.SELECT }
	);
	powerBank = p!.id;
});

afterAll(async () => {
	if (added.length)
		await sequelize.query('DELETE FROM supporting_documents WHERE id IN (:ids)', {
			replacements: { ids: added }
		});
});

async function keep<T extends { ok: boolean }>(result: T): Promise<T> {
	if (result.ok) added.push((result as unknown as { value: { id: string } }).value.id);
	return result;
}

describe('uploads', () => {
	it('refuses an executable renamed .pdf, and writes nothing', async () => {
		const before = await listSupportingDocuments(coordinator, { shipmentId: hallvikShip });
		const exe = new TextEncoder().encode('MZ\x90\x00\x03\x00 a Windows program');
		const result = await upload(coordinator, { shipmentId: hallvikShip }, 'summary.pdf', exe);
		expect(result).toMatchObject({
			ok: false,
			status: 400,
			fieldErrors: { file: expect.stringMatching(/PDF, PNG or JPEG/) }
		});
		const elf = new Uint8Array([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0]);
		expect(await upload(coordinator, { shipmentId: hallvikShip }, 'a.pdf', elf)).toMatchObject({
			ok: false,
			status: 400
		});
		expect(await listSupportingDocuments(coordinator, { shipmentId: hallvikShip })).toHaveLength(
			before!.length
		);
	});

	it('refuses an 11 MB file', async () => {
		const big = new Uint8Array(11 * 1024 * 1024);
		big.set(PDF);
		const result = await upload(coordinator, { shipmentId: hallvikShip }, 'big.pdf', big);
		expect(result).toMatchObject({
			ok: false,
			status: 400,
			fieldErrors: { file: expect.stringMatching(/at most 10 MB/) }
		});
	});

	it('strips a path from the file name and stores the SHA-256', async () => {
		const result = await keep(
			await upload(coordinator, { shipmentId: hallvikShip }, '../../etc/passwd.pdf', PDF)
		);
		expect(result).toMatchObject({ ok: true, value: { fileName: 'passwd.pdf' } });
		// SHA-256 of the 15 bytes "%PDF-1.4\n%%EOF\n", computed with node:crypto independently below.
		const { createHash } = await import('node:crypto');
		expect(result.ok && result.value.sha256).toBe(createHash('sha256').update(PDF).digest('hex'));
	});

	it('lets only coordinators and administrators upload', async () => {
		for (const user of [finance, hallvikBuyer, broker])
			expect(await upload(user, { shipmentId: hallvikShip }, 'x.pdf', PDF)).toMatchObject({
				ok: false,
				status: 403
			});
	});
});

describe('downloads', () => {
	let hallvikDoc: string;
	let productDoc: string;

	beforeAll(async () => {
		const a = await keep(
			await upload(coordinator, { shipmentId: hallvikShip }, 'origin.pdf', PDF, 'proof_of_origin')
		);
		const b = await keep(await upload(coordinator, { productId: powerBank }, 'sds.pdf', PDF));
		if (!a.ok || !b.ok) throw new Error('set-up');
		hallvikDoc = a.value.id;
		productDoc = b.value.id;
	});

	it('gives the buyer its own shipment’s file and logs the download', async () => {
		const file = await downloadSupportingDocument(
			hallvikBuyer,
			{ shipmentId: hallvikShip },
			hallvikDoc,
			'file'
		);
		expect(file?.content.subarray(0, 5).toString()).toBe('%PDF-');
		const [log] = await sequelize.query<{ n: number }>(
			'SELECT count(*)::int AS n FROM supporting_document_downloads WHERE document_id = :id AND user_id = :user',
			{ replacements: { id: hallvikDoc, user: hallvikBuyer.id }, type: QueryTypes.SELECT }
		);
		expect(log!.n).toBe(1);
	});

	it('does not let another customer download it, by any path', async () => {
		expect(
			await downloadSupportingDocument(
				wattlebirdBuyer,
				{ shipmentId: hallvikShip },
				hallvikDoc,
				'file'
			)
		).toBeNull();
		// The document id under the customer's own shipment is not enough either.
		expect(
			await downloadSupportingDocument(
				wattlebirdBuyer,
				{ shipmentId: wattlebirdShip },
				hallvikDoc,
				'file'
			)
		).toBeNull();
		expect(await listSupportingDocuments(wattlebirdBuyer, { shipmentId: hallvikShip })).toBeNull();
	});

	it('shows product documents to staff and the assigned broker, never to customers', async () => {
		expect(
			await downloadSupportingDocument(broker, { productId: powerBank }, productDoc, 'file')
		).not.toBeNull();
		expect(
			await downloadSupportingDocument(finance, { productId: powerBank }, productDoc, 'file')
		).not.toBeNull();
		expect(
			await downloadSupportingDocument(hallvikBuyer, { productId: powerBank }, productDoc, 'file')
		).toBeNull();
		expect(await listSupportingDocuments(hallvikBuyer, { productId: powerBank })).toBeNull();
	});
});

describe('what the readiness check sees', () => {
	it('counts a current UN38.3 summary on the product, and no longer once retired or expired', async () => {
		const today = '2026-12-02';
		const none = await currentDocumentsOfKind('un38_3_summary', wattlebirdShip, [powerBank], today);
		const had = none.products.has(powerBank);
		const r = await keep(
			await uploadSupportingDocument(
				coordinator,
				{ productId: powerBank },
				{
					kind: 'un38_3_summary',
					title: 'itest UN38.3',
					issuedOn: '2026-01-10',
					expiresOn: '2027-01-09',
					fileName: 'un383.pdf',
					bytes: PDF
				},
				IP
			)
		);
		if (!r.ok) throw new Error(r.message);
		expect(
			(
				await currentDocumentsOfKind('un38_3_summary', wattlebirdShip, [powerBank], today)
			).products.has(powerBank)
		).toBe(true);
		expect(
			(
				await currentDocumentsOfKind('un38_3_summary', wattlebirdShip, [powerBank], '2027-01-10')
			).products.has(powerBank)
		).toBe(had);
		expect(
			await retireSupportingDocument(coordinator, { productId: powerBank }, r.value.id, IP)
		).toMatchObject({ ok: true });
		expect(
			(
				await currentDocumentsOfKind('un38_3_summary', wattlebirdShip, [powerBank], today)
			).products.has(powerBank)
		).toBe(had);
	});
});
