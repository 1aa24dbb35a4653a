// Supporting documents against the real database: what an upload may be, who sees and downloads
// what (scoped in SQL), the download log, the readiness query and the one expiry reminder each
// document gets. Uses the demo shipments and products read-only and deletes its own documents.
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SessionUser } from '$lib/server/auth/session-user';
import { Product, Shipment } from '$lib/server/db/models';
import type { ServiceResult } from '$lib/server/services/result';
import {
	currentDocumentsOfKind,
	downloadSupportingDocument,
	listSupportingDocuments,
	retireSupportingDocument,
	uploadSupportingDocument,
	type DocumentOwner,
	type UploadInput
} from '$lib/server/services/supporting-documents';
import {
	findExpiringDocuments,
	sendExpiryReminders
} from '$lib/server/services/supporting-document-expiry';
import { countRows, sequelize, sessionUserFor } from './db';

const IP = '198.51.100.91'; // RFC 5737 TEST-NET-2
const PDF = new TextEncoder().encode(
	'%PDF-1.4\n1 0 obj<</Type/Catalog>>endobj\ntrailer<<>>\n%%EOF\n'
);
const created = new Set<string>();
let coordinator: SessionUser;
let finance: SessionUser;
let hallvikBuyer: SessionUser;
let wattlebirdBuyer: SessionUser;
let broker: SessionUser;
/** SHP-2026-00001 (Hallvik, broker Kaaiman), SHP-2026-00002 (Wattlebird, no broker). */
const ship = { hallvik: '', wattlebird: '' };
const product = { powerBank: '', sensor: '' };

function ok<T>(result: ServiceResult<T>, what: string): T {
	if (!result.ok) throw new Error(`${what} was refused: ${JSON.stringify(result)}`);
	return result.value;
}

async function upload(owner: DocumentOwner, input: Partial<UploadInput> = {}, user = coordinator) {
	const result = await uploadSupportingDocument(
		user,
		owner,
		{
			kind: 'other',
			title: 'Integration test document',
			issuedOn: null,
			expiresOn: null,
			fileName: 'test.pdf',
			bytes: PDF,
			...input
		},
		IP
	);
	if (result.ok) created.add(result.value.id);
	return result;
}

const ownRows = () =>
	countRows('supporting_documents', 'id IN (:ids)', { ids: [...created, crypto.randomUUID()] });

beforeAll(async () => {
	[coordinator, finance, hallvikBuyer, wattlebirdBuyer, broker] = await Promise.all([
		sessionUserFor('coordinator@solvrae.example'),
		sessionUserFor('finance@solvrae.example'),
		sessionUserFor('buyer@hallvik.example'),
		sessionUserFor('buyer@wattlebird.example'),
		sessionUserFor('broker@kaaiman.example')
	]);
	const byRef = async (reference: string) =>
		(await Shipment.findOne({ where: { reference }, rejectOnEmpty: true })).id;
	ship.hallvik = await byRef('SHP-2026-00001');
	ship.wattlebird = await byRef('SHP-2026-00002');
	const bySku = async (sku: string) =>
		(await Product.findOne({ where: { sku }, rejectOnEmpty: true })).id;
	product.powerBank = await bySku('SLV-PWR-20K'); // on SHP-1 and SHP-3
	product.sensor = await bySku('SLV-SNS-TH1'); // only on SHP-2
});

afterAll(async () => {
	if (created.size === 0) return;
	// Downloads go with their document (ON DELETE CASCADE).
	await sequelize.query('DELETE FROM supporting_documents WHERE id IN (:ids)', {
		replacements: { ids: [...created] }
	});
});

describe('what an upload may be', () => {
	it('refuses an executable named .pdf, on the file field, and stores nothing', async () => {
		const before = await countRows('supporting_documents');
		for (const bytes of [
			new Uint8Array([0x4d, 0x5a, 0x90, 0x00, 0x03, 0x00]), // "MZ": a Windows PE executable
			new Uint8Array([0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01]) // ELF
		]) {
			const result = await upload({ shipmentId: ship.hallvik }, { fileName: 'summary.pdf', bytes });
			expect(result).toMatchObject({ ok: false, status: 400 });
			expect(!result.ok && result.fieldErrors.file).toMatch(/Only PDF, PNG or JPEG/);
		}
		expect(await countRows('supporting_documents')).toBe(before);
	});

	it('refuses an 11 MB file', async () => {
		const big = new Uint8Array(11 * 1024 * 1024);
		big.set(PDF);
		const result = await upload({ shipmentId: ship.hallvik }, { fileName: 'big.pdf', bytes: big });
		expect(result).toMatchObject({ ok: false, status: 400 });
		expect(!result.ok && result.fieldErrors.file).toMatch(/11\.0 MB; at most 10 MB/);
	});

	it('strips a path from the file name, Unix or Windows', async () => {
		const a = ok(
			await upload({ shipmentId: ship.hallvik }, { fileName: '../../etc/passwd.pdf' }),
			'upload'
		);
		const b = ok(
			await upload({ shipmentId: ship.hallvik }, { fileName: 'C:\\x\\y.pdf' }),
			'upload'
		);
		expect(a.fileName).toBe('passwd.pdf');
		expect(b.fileName).toBe('y.pdf');
		const [row] = await sequelize.query<{ file_name: string }>(
			'SELECT file_name FROM supporting_documents WHERE id = :id',
			{ replacements: { id: a.id }, type: QueryTypes.SELECT }
		);
		expect(row?.file_name).toBe('passwd.pdf');
	});

	it('stores the bytes with their SHA-256, the uploader and an audit event', async () => {
		const { id, sha256 } = ok(await upload({ productId: product.powerBank }), 'upload');
		// SHA-256 of these bytes, computed independently of Landfall by PostgreSQL's sha256().
		const [row] = await sequelize.query<{ db: string; uploaded_by: string; audit: number }>(
			`SELECT encode(sha256(content), 'hex') AS db, uploaded_by,
			        (SELECT count(*)::int FROM audit_events WHERE entity_id = :id
			           AND action = 'supporting_document.upload') AS audit
			   FROM supporting_documents WHERE id = :id`,
			{ replacements: { id }, type: QueryTypes.SELECT }
		);
		expect(row).toEqual({ db: sha256, uploaded_by: coordinator.id, audit: 1 });
	});

	it('lets only coordinators and administrators upload, and only onto what exists', async () => {
		const before = await ownRows();
		expect(await upload({ shipmentId: ship.hallvik }, {}, finance)).toMatchObject({
			ok: false,
			status: 403
		});
		expect(await upload({ shipmentId: ship.hallvik }, {}, broker)).toMatchObject({
			ok: false,
			status: 403
		});
		expect(await upload({ shipmentId: ship.hallvik }, {}, hallvikBuyer)).toMatchObject({
			ok: false,
			status: 403
		});
		expect(await upload({ shipmentId: crypto.randomUUID() })).toMatchObject({
			ok: false,
			status: 404
		});
		expect(await ownRows()).toBe(before);
	});
});

describe('who sees and downloads what', () => {
	let hallvikDoc = '';
	let wattlebirdDoc = '';
	let powerBankDoc = '';
	let sensorDoc = '';

	beforeAll(async () => {
		const id = async (owner: DocumentOwner, title: string) =>
			ok(await upload(owner, { title }), 'upload').id;
		hallvikDoc = await id({ shipmentId: ship.hallvik }, 'Hallvik shipment document');
		wattlebirdDoc = await id({ shipmentId: ship.wattlebird }, 'Wattlebird shipment document');
		powerBankDoc = await id({ productId: product.powerBank }, 'Power bank document');
		sensorDoc = await id({ productId: product.sensor }, 'Sensor document');
	});

	it("gives a customer its own shipment's document and a 404 (null) for another's", async () => {
		const own = await downloadSupportingDocument(
			hallvikBuyer,
			{ shipmentId: ship.hallvik },
			hallvikDoc,
			'file'
		);
		expect(own && new Uint8Array(own.content)).toEqual(PDF);
		// Another customer's document, asked for under its own shipment or under one's own: nothing.
		expect(
			await downloadSupportingDocument(
				hallvikBuyer,
				{ shipmentId: ship.wattlebird },
				wattlebirdDoc,
				'file'
			)
		).toBeNull();
		expect(
			await downloadSupportingDocument(
				hallvikBuyer,
				{ shipmentId: ship.hallvik },
				wattlebirdDoc,
				'file'
			)
		).toBeNull();
		expect(await listSupportingDocuments(hallvikBuyer, { shipmentId: ship.wattlebird })).toBeNull();
		const list = await listSupportingDocuments(wattlebirdBuyer, { shipmentId: ship.wattlebird });
		expect(list?.map((d) => d.id)).toContain(wattlebirdDoc);
	});

	it('keeps product documents from customers; brokers see those of their shipments', async () => {
		expect(
			await downloadSupportingDocument(
				hallvikBuyer,
				{ productId: product.powerBank },
				powerBankDoc,
				'file'
			)
		).toBeNull();
		expect(
			await listSupportingDocuments(hallvikBuyer, { productId: product.powerBank })
		).toBeNull();
		// Kaaiman is the broker of SHP-1, which carries the power bank but not the sensor.
		expect(
			await downloadSupportingDocument(
				broker,
				{ productId: product.powerBank },
				powerBankDoc,
				'file'
			)
		).not.toBeNull();
		expect(
			await downloadSupportingDocument(broker, { productId: product.sensor }, sensorDoc, 'file')
		).toBeNull();
		expect(
			await downloadSupportingDocument(
				broker,
				{ shipmentId: ship.wattlebird },
				wattlebirdDoc,
				'file'
			)
		).toBeNull();
		expect(
			await downloadSupportingDocument(broker, { shipmentId: ship.hallvik }, hallvikDoc, 'file')
		).not.toBeNull();
		// Staff see everything.
		expect(
			await downloadSupportingDocument(finance, { productId: product.sensor }, sensorDoc, 'file')
		).not.toBeNull();
	});

	it('logs every download with who, how and from where, and only real ones', async () => {
		const logged = () =>
			countRows('supporting_document_downloads', 'document_id = :id', { id: wattlebirdDoc });
		const before = await logged();
		await downloadSupportingDocument(
			wattlebirdBuyer,
			{ shipmentId: ship.wattlebird },
			wattlebirdDoc,
			'file',
			'203.0.113.7'
		);
		await downloadSupportingDocument(
			coordinator,
			{ shipmentId: ship.wattlebird },
			wattlebirdDoc,
			'api'
		);
		await downloadSupportingDocument(
			hallvikBuyer,
			{ shipmentId: ship.wattlebird },
			wattlebirdDoc,
			'file'
		);
		expect(await logged()).toBe(before + 2);
		const rows = await sequelize.query<{ user_id: string; via: string; ip: string | null }>(
			`SELECT user_id, via, ip FROM supporting_document_downloads WHERE document_id = :id
			  ORDER BY id DESC LIMIT 2`,
			{ replacements: { id: wattlebirdDoc }, type: QueryTypes.SELECT }
		);
		expect(rows).toEqual([
			{ user_id: coordinator.id, via: 'api', ip: null },
			{ user_id: wattlebirdBuyer.id, via: 'file', ip: '203.0.113.7' }
		]);
		const list = await listSupportingDocuments(coordinator, { shipmentId: ship.wattlebird });
		expect(list?.find((d) => d.id === wattlebirdDoc)?.downloads).toBe(before + 2);
	});

	it('retires (staff only); a retired document stays listed but is no longer current', async () => {
		expect(
			await retireSupportingDocument(finance, { productId: product.sensor }, sensorDoc, IP)
		).toMatchObject({ ok: false, status: 403 });
		ok(
			await retireSupportingDocument(coordinator, { productId: product.sensor }, sensorDoc, IP),
			'retire'
		);
		expect(
			await retireSupportingDocument(coordinator, { productId: product.sensor }, sensorDoc, IP)
		).toMatchObject({ ok: false, status: 404 });
		const row = (await listSupportingDocuments(coordinator, { productId: product.sensor }))?.find(
			(d) => d.id === sensorDoc
		);
		expect(row).toMatchObject({ current: false });
		expect(row?.retiredAt).not.toBeNull();
	});
});

describe('currentDocumentsOfKind (for the readiness checklist)', () => {
	it('counts a document up to and including its expiry date, never a retired one', async () => {
		const kind = 'un38_3_summary';
		const dated = ok(
			await upload(
				{ productId: product.sensor },
				{ kind, title: 'Sensor UN38.3', issuedOn: '2030-01-01', expiresOn: '2030-06-30' }
			),
			'upload'
		).id;
		const onShipment = ok(
			await upload({ shipmentId: ship.wattlebird }, { kind, title: 'Shipment UN38.3' }),
			'upload'
		).id;
		const ids = async (date: string, shipmentId?: string) =>
			(await currentDocumentsOfKind([product.sensor], kind, date, { shipmentId }))
				.map((d) => d.id)
				.filter((id) => created.has(id));
		expect(await ids('2030-06-30')).toEqual([dated]);
		expect(await ids('2030-07-01')).toEqual([]);
		expect((await ids('2030-06-30', ship.wattlebird)).sort()).toEqual([dated, onShipment].sort());
		expect(await currentDocumentsOfKind([], kind, '2030-06-30')).toEqual([]);
		// Another kind does not count.
		expect(
			(await currentDocumentsOfKind([product.sensor], 'safety_data_sheet', '2030-06-30')).filter(
				(d) => d.id === dated
			)
		).toEqual([]);
		ok(
			await retireSupportingDocument(coordinator, { productId: product.sensor }, dated, IP),
			'retire'
		);
		expect(await ids('2030-06-30')).toEqual([]);
	});
});

describe('expiry reminders', () => {
	// Dates in 2031, so the demo's own documents (dated from the seeding day) are never picked.
	const NOW = new Date('2031-03-01T06:00:00Z');

	it('picks a document lapsing within the window once, and never an expired or retired one', async () => {
		const doc = async (expiresOn: string, title: string) =>
			ok(
				await upload(
					{ productId: product.powerBank },
					{ kind: 'safety_data_sheet', title, expiresOn }
				),
				'upload'
			).id;
		const soon = await doc('2031-03-10', 'Lapses in 9 days');
		const today = await doc('2031-03-01', 'Lapses today');
		const later = await doc('2031-05-30', 'Lapses in 90 days');
		const past = await doc('2031-02-28', 'Lapsed yesterday');
		const retired = await doc('2031-03-05', 'Retired');
		ok(
			await retireSupportingDocument(coordinator, { productId: product.powerBank }, retired, IP),
			'retire'
		);
		const mine = <T extends { id?: string; documentId?: string }>(rows: T[]) =>
			rows.map((r) => r.id ?? r.documentId).filter((id) => id && created.has(id));

		expect(mine(await findExpiringDocuments(30, NOW))).toEqual([today, soon]);

		// Two runs at once: each document is reminded by exactly one of them.
		const [a, b] = await Promise.all([sendExpiryReminders(NOW), sendExpiryReminders(NOW)]);
		expect([...mine(a), ...mine(b)].sort()).toEqual([today, soon].sort());
		const notice = [...a, ...b].find((n) => n.documentId === soon);
		expect(notice).toMatchObject({
			kindLabel: 'Safety data sheet',
			expiresOn: '2031-03-10',
			daysLeft: 9,
			owner: { productId: product.powerBank, productSku: 'SLV-PWR-20K' },
			uploadedByUserId: coordinator.id,
			path: `/products/${product.powerBank}#supporting-documents-heading`
		});

		// Picked once: a later run finds nothing new, until `later` comes into the window.
		expect(mine(await sendExpiryReminders(NOW))).toEqual([]);
		expect(mine(await findExpiringDocuments(30, NOW))).toEqual([]);
		expect(mine(await sendExpiryReminders(new Date('2031-05-01T06:00:00Z')))).toEqual([later]);
		const [mark] = await sequelize.query<{ reminder_sent_at: Date }>(
			'SELECT reminder_sent_at FROM supporting_documents WHERE id = :id',
			{ replacements: { id: soon }, type: QueryTypes.SELECT }
		);
		expect(mark?.reminder_sent_at.toISOString()).toBe(NOW.toISOString());
		expect(mine(await findExpiringDocuments(3000, NOW))).not.toContain(past);
		// Each reminder is one queued e-mail per keeper, the uploader among them.
		const mail = await sequelize.query<{ recipient: string; subject: string }>(
			`SELECT recipient, subject FROM mail_outbox WHERE dedupe_key LIKE :key`,
			{ replacements: { key: `document_reminder:${soon}:%` }, type: QueryTypes.SELECT }
		);
		expect(mail.map((m) => m.recipient)).toContain(coordinator.email);
		expect(mail[0]!.subject).toBe('Safety data sheet lapses in 9 days: Lapses in 9 days');
	});

	it('refuses a window that is not a whole number of days', async () => {
		await expect(findExpiringDocuments(1.5, NOW)).rejects.toThrow(RangeError);
		await expect(sendExpiryReminders(NOW, -1)).rejects.toThrow(RangeError);
	});
});
