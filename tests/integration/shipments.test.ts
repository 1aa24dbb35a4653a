// The shipment services (create, lines, measure, status, containers, detail and list) against the
// real database, called directly with the SessionUsers the app builds for the demo users. Every
// shipment a test makes is its own (unique booking numbers where a list is read) and is deleted
// again when the file ends; other files may create shipments too, so lists are always narrowed to
// this file's shipments before they are counted.
import { randomUUID } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { z } from 'zod';
import type { SessionUser } from '$lib/server/auth/session-user';
import {
	AuditEvent,
	ContainerTypeRow,
	Party,
	Place,
	Product,
	Shipment,
	ShipmentContainer,
	ShipmentLine,
	ShipmentStatusEvent
} from '$lib/server/db/models';
import { getShipment } from '$lib/server/services/shipment-detail';
import { listShipments } from '$lib/server/services/shipment-list';
import { measureShipment } from '$lib/server/services/shipment-measure';
import {
	addContainer,
	changeStatus,
	createShipment,
	replaceLines,
	updatePaperDetails,
	updateShipment
} from '$lib/server/services/shipments';
import { issuePapers } from '$lib/server/services/documents/issue';
import type { ServiceResult } from '$lib/server/services/users';
import { paperDetailsSchema } from '$lib/schemas/documents';
import {
	containerSchema,
	shipmentLinesSchema,
	shipmentListQuerySchema,
	shipmentSchema,
	statusChangeSchema,
	type ShipmentInput
} from '$lib/schemas/shipments';
import type { ShipmentStatus } from '$lib/trade/shipment-status';
import { countRows, demoOrganization, sequelize, sessionUserFor, uniqueSuffix } from './db';
import { ok } from './service-results';

const IP = '198.51.100.77'; // RFC 5737 TEST-NET-2: only stored in audit_events.ip
const MISSING_ID = '00000000-0000-4000-8000-000000000000';

let coordinator: SessionUser;
let hallvikBuyer: SessionUser;
let wattlebirdBuyer: SessionUser;
let broker: SessionUser;
const org = { exporter: '', hallvik: '', wattlebird: '', broker: '' };
const place: Record<string, string> = {};
const product: Record<string, { id: string; unitPrice: string }> = {};
let containerTypeId = '';
let hallvikConsignee = '';

const createdShipments = new Set<string>();

beforeAll(async () => {
	[coordinator, hallvikBuyer, wattlebirdBuyer, broker] = await Promise.all([
		sessionUserFor('coordinator@solvrae.example'),
		sessionUserFor('buyer@hallvik.example'),
		sessionUserFor('buyer@wattlebird.example'),
		sessionUserFor('broker@kaaiman.example')
	]);
	for (const key of ['exporter', 'hallvik', 'wattlebird', 'broker'] as const) {
		org[key] = (await demoOrganization(key)).id;
	}
	for (const p of await Place.findAll({ attributes: ['id', 'code'] })) place[p.code] = p.id;
	for (const p of await Product.findAll({ attributes: ['id', 'sku', 'unitPrice'] })) {
		product[p.sku] = { id: p.id, unitPrice: p.unitPrice };
	}
	const containerType = await ContainerTypeRow.findOne({ order: [['code', 'ASC']] });
	if (!containerType) throw new Error('No container types: is the database seeded?');
	containerTypeId = containerType.id;
	const consignee = await Party.findOne({
		where: { name: 'Hallvik Heimtechnik GmbH — Distribution centre' }
	});
	if (!consignee) throw new Error('No demo consignee: is the database seeded?');
	hallvikConsignee = consignee.id;
});

// Registered after db.ts's own afterAll, so it runs first (vitest runs after-hooks as a stack)
// while the connection is still open. Lines, events and containers go with their shipment
// (ON DELETE CASCADE); audit events stay, as they would in the app.
afterAll(async () => {
	if (createdShipments.size > 0) {
		// Issued papers are kept on purpose (ON DELETE RESTRICT); a test cleans them up itself.
		await sequelize.query('DELETE FROM shipment_documents WHERE shipment_id IN (:ids)', {
			replacements: { ids: [...createdShipments] }
		});
		await Shipment.destroy({ where: { id: [...createdShipments] } });
	}
});

function placeId(code: string): string {
	const id = place[code];
	if (!id) throw new Error(`No demo place ${code}: is the database seeded?`);
	return id;
}

function productOf(sku: string): { id: string; unitPrice: string } {
	const p = product[sku];
	if (!p) throw new Error(`No demo product ${sku}: is the database seeded?`);
	return p;
}

function refused<T>(result: ServiceResult<T>) {
	if (result.ok) throw new Error(`Expected a refusal, got ${JSON.stringify(result.value)}`);
	return result;
}

/** A valid header: Hallvik, FOB Port Klang, Port Klang → Hamburg by sea (invented demo data). */
function shipmentInput(overrides: Partial<z.input<typeof shipmentSchema>> = {}): ShipmentInput {
	return shipmentSchema.parse({
		customerId: org.hallvik,
		incoterm: 'FOB',
		incotermPlace: 'Port Klang',
		originId: placeId('MYPKG'),
		destinationId: placeId('DEHAM'),
		modesConsidered: ['sea_fcl', 'air'],
		chosenMode: 'sea_fcl',
		currency: 'USD',
		...overrides
	});
}

async function create(
	overrides: Partial<z.input<typeof shipmentSchema>> = {}
): Promise<{ id: string; reference: string }> {
	const value = ok(await createShipment(coordinator, shipmentInput(overrides), IP), 'create');
	createdShipments.add(value.id);
	return value;
}

async function versionOf(id: string): Promise<number> {
	const shipment = await Shipment.findByPk(id, { attributes: ['version'] });
	if (!shipment) throw new Error(`Shipment ${id} is gone`);
	return shipment.version;
}

async function statusOf(id: string): Promise<ShipmentStatus> {
	return (await Shipment.findByPk(id, { attributes: ['status'], rejectOnEmpty: true })).status;
}

function linesInput(
	lines: { sku: string; quantity: number; unitPrice?: string }[],
	version: number
) {
	return shipmentLinesSchema.parse({
		lines: lines.map((l) => ({
			productId: productOf(l.sku).id,
			quantity: l.quantity,
			unitPrice: l.unitPrice ?? ''
		})),
		version
	});
}

async function setLines(
	id: string,
	lines: { sku: string; quantity: number; unitPrice?: string }[],
	actor = coordinator
) {
	return replaceLines(actor, id, linesInput(lines, await versionOf(id)), IP);
}

async function moveTo(id: string, to: ShipmentStatus, actor = coordinator, note = '') {
	return changeStatus(
		actor,
		id,
		statusChangeSchema.parse({ to, note, version: await versionOf(id) }),
		IP
	);
}

/** Issues both papers, as the papers panel does: the details they print first. */
async function issueBoth(id: string) {
	const details = {
		paymentTerms: '30 days net',
		exportReason: 'Sale',
		signatoryName: 'Test Signatory',
		signatoryTitle: 'Export coordinator',
		signingPlace: 'Penang',
		version: await versionOf(id)
	};
	ok(
		await updatePaperDetails(coordinator, id, paperDetailsSchema.parse(details), IP),
		'paper details'
	);
	const kinds = ['commercial_invoice', 'packing_list'] as const;
	return ok(await issuePapers(coordinator, id, { kinds: [...kinds], reason: '' }, IP), 'issue');
}

async function storedLines(id: string) {
	return ShipmentLine.findAll({
		where: { shipmentId: id },
		order: [['position', 'ASC']],
		raw: true
	});
}

async function statusEvents(id: string) {
	return ShipmentStatusEvent.findAll({
		where: { shipmentId: id },
		order: [['id', 'ASC']],
		raw: true
	});
}

async function auditEvents(id: string) {
	return AuditEvent.findAll({
		where: { entity: 'shipment', entityId: id },
		order: [['id', 'ASC']],
		raw: true
	});
}

async function counterValue(year: number): Promise<number> {
	const [row] = await sequelize.query<{ last_value: number }>(
		`SELECT last_value FROM shipment_reference_counters WHERE exporter_id = :exporterId AND year = :year`,
		{ type: QueryTypes.SELECT, replacements: { exporterId: org.exporter, year } }
	);
	return row?.last_value ?? 0;
}

function sequenceNumber(reference: string): number {
	const match = /^SHP-\d{4}-(\d{5})$/.exec(reference);
	if (!match) throw new Error(`Not a shipment reference: ${reference}`);
	return Number(match[1]);
}

function query(input: Partial<z.input<typeof shipmentListQuerySchema>>) {
	return shipmentListQuerySchema.parse(input);
}

describe('createShipment', () => {
	it('numbers the shipment SHP-YYYY-NNNNN and stores it as a draft of the exporter', async () => {
		const year = new Date().getUTCFullYear();
		const { id, reference } = await create();
		expect(reference).toMatch(new RegExp(`^SHP-${year}-\\d{5}$`));
		expect(sequenceNumber(reference)).toBe(await counterValue(year));
		const row = await Shipment.findByPk(id, { raw: true });
		expect(row).toMatchObject({
			reference,
			status: 'draft',
			version: 0,
			exporterId: org.exporter,
			customerId: org.hallvik,
			createdBy: coordinator.id,
			chosenMode: 'sea_fcl',
			brokerId: null
		});
	});

	it('records the draft status event and a shipment.create audit event', async () => {
		const { id, reference } = await create();
		const events = await statusEvents(id);
		expect(events).toHaveLength(1);
		expect(events[0]).toMatchObject({
			fromStatus: null,
			toStatus: 'draft',
			actorUserId: coordinator.id
		});
		const audit = await auditEvents(id);
		expect(audit.map((a) => a.action)).toEqual(['shipment.create']);
		expect(audit[0]).toMatchObject({ actorUserId: coordinator.id, entity: 'shipment', ip: IP });
		expect(audit[0]!.after).toMatchObject({ reference, customerId: org.hallvik });
	});

	it('gives 20 parallel creates 20 distinct, consecutive references (gap-free under concurrency)', async () => {
		const results = await Promise.all(
			Array.from({ length: 20 }, (_, i) =>
				createShipment(coordinator, shipmentInput({ notes: `Parallel create ${i + 1}` }), IP)
			)
		);
		const values = results.map((r, i) => ok(r, `parallel create ${i + 1}`));
		values.forEach((v) => createdShipments.add(v.id));
		const references = values.map((v) => v.reference);
		expect(new Set(references).size).toBe(20);
		const numbers = references.map(sequenceNumber).sort((a, b) => a - b);
		const first = numbers[0]!;
		expect(numbers).toEqual(Array.from({ length: 20 }, (_, i) => first + i));
		expect(await counterValue(new Date().getUTCFullYear())).toBe(first + 19);
		// Every one of them is a stored draft with its own status event.
		expect(await countRows('shipments', 'id IN (:ids)', { ids: values.map((v) => v.id) })).toBe(20);
		expect(
			await countRows('shipment_status_events', "shipment_id IN (:ids) AND to_status = 'draft'", {
				ids: values.map((v) => v.id)
			})
		).toBe(20);
	});

	it('refuses a customerId that is the exporter itself, with a field error and no row', async () => {
		const year = new Date().getUTCFullYear();
		const before = { shipments: await countRows('shipments'), counter: await counterValue(year) };
		const result = refused(
			await createShipment(coordinator, shipmentInput({ customerId: org.exporter }), IP)
		);
		expect(result.status).toBe(400);
		expect(result.fieldErrors).toHaveProperty('customerId');
		expect(Object.keys(result.fieldErrors)).toEqual(['customerId']);
		expect(await countRows('shipments')).toBe(before.shipments);
		expect(await counterValue(year)).toBe(before.counter);
	});

	it('refuses unknown places and a broker that is not a broker firm, with no row', async () => {
		const before = await countRows('shipments');
		const result = refused(
			await createShipment(
				coordinator,
				shipmentInput({ originId: randomUUID(), destinationId: MISSING_ID, brokerId: org.hallvik }),
				IP
			)
		);
		expect(result.status).toBe(400);
		expect(result.fieldErrors).toMatchObject({
			originId: expect.any(String),
			destinationId: expect.any(String),
			brokerId: expect.any(String)
		});
		expect(result.fieldErrors).not.toHaveProperty('customerId');
		expect(await countRows('shipments')).toBe(before);
	});

	it('refuses an unknown pallet type with a field error, no row', async () => {
		const before = await countRows('shipments');
		const result = refused(
			await createShipment(coordinator, shipmentInput({ palletTypeId: randomUUID() }), IP)
		);
		expect(result.status).toBe(400);
		expect(Object.keys(result.fieldErrors)).toEqual(['palletTypeId']);
		expect(await countRows('shipments')).toBe(before);
	});

	it('does not use up a reference on a refused create: the next one follows on', async () => {
		const a = await create();
		refused(await createShipment(coordinator, shipmentInput({ originId: randomUUID() }), IP));
		const b = await create();
		expect(sequenceNumber(b.reference)).toBe(sequenceNumber(a.reference) + 1);
	});
});

describe('replaceLines', () => {
	it('saves the lines with positions 1..n; an empty unit price takes the product’s price', async () => {
		const { id } = await create();
		const value = ok(
			await setLines(id, [
				{ sku: 'SLV-PBL-20', quantity: 250 },
				{ sku: 'SLV-TWR-80', quantity: 8, unitPrice: '199.5' },
				{ sku: 'SLV-SNS-DW2', quantity: 600 }
			]),
			'replaceLines'
		);
		expect(value).toEqual({ id, lines: 3 });
		const lines = await storedLines(id);
		expect(lines.map((l) => l.position)).toEqual([1, 2, 3]);
		expect(lines.map((l) => [l.productId, l.quantity, l.unitPrice])).toEqual([
			[productOf('SLV-PBL-20').id, 250, productOf('SLV-PBL-20').unitPrice],
			[productOf('SLV-TWR-80').id, 8, '199.5000'],
			[productOf('SLV-SNS-DW2').id, 600, productOf('SLV-SNS-DW2').unitPrice]
		]);
		expect(productOf('SLV-PBL-20').unitPrice).toBe('38.5000'); // seeders/demo-catalogue.ts
		expect(await versionOf(id)).toBe(1);
		expect((await auditEvents(id)).map((a) => a.action)).toEqual([
			'shipment.create',
			'shipment.lines'
		]);
	});

	it('replaces all lines: a shorter list renumbers from 1 and leaves nothing behind', async () => {
		const { id } = await create();
		ok(
			await setLines(id, [
				{ sku: 'SLV-PBL-20', quantity: 10 },
				{ sku: 'SLV-TWR-80', quantity: 2 },
				{ sku: 'SLV-SNS-DW2', quantity: 5 }
			]),
			'first replaceLines'
		);
		ok(await setLines(id, [{ sku: 'SLV-SNS-DW2', quantity: 7 }]), 'second replaceLines');
		const lines = await storedLines(id);
		expect(lines.map((l) => [l.position, l.productId, l.quantity])).toEqual([
			[1, productOf('SLV-SNS-DW2').id, 7]
		]);
		expect(await versionOf(id)).toBe(2);
	});

	it('answers 409 for a stale version and changes nothing', async () => {
		const { id } = await create();
		ok(await setLines(id, [{ sku: 'SLV-PBL-20', quantity: 12 }]), 'replaceLines');
		const before = await storedLines(id);
		const result = refused(
			await replaceLines(coordinator, id, linesInput([{ sku: 'SLV-TWR-80', quantity: 1 }], 0), IP)
		);
		expect(result.status).toBe(409);
		expect(await storedLines(id)).toEqual(before);
		expect(await versionOf(id)).toBe(1);
		expect((await auditEvents(id)).filter((a) => a.action === 'shipment.lines')).toHaveLength(1);
	});

	it('names the line of an unknown product (lines.0.productId) and changes nothing', async () => {
		const { id } = await create();
		const result = refused(
			await replaceLines(
				coordinator,
				id,
				shipmentLinesSchema.parse({
					lines: [
						{ productId: randomUUID(), quantity: 1 },
						{ productId: productOf('SLV-PBL-20').id, quantity: 1 }
					],
					version: 0
				}),
				IP
			)
		);
		expect(result.status).toBe(400);
		expect(Object.keys(result.fieldErrors)).toEqual(['lines.0.productId']);
		expect(await storedLines(id)).toEqual([]);
		expect(await versionOf(id)).toBe(0);
	});
});

describe('measureShipment', () => {
	it('packs SLV-PBL-20 × 250 into 21 cartons, 180.200 kg gross and 0.63 m³', async () => {
		const { id } = await create();
		ok(await setLines(id, [{ sku: 'SLV-PBL-20', quantity: 250 }]), 'replaceLines');
		const measured = await measureShipment(coordinator, id);
		expect(measured).not.toBeNull();
		const result = measured!.result;
		if (!result.ok) throw new Error(`measure failed: ${JSON.stringify(result.problems)}`);
		// 12 per carton: 250 = 20 × 12 + 10.
		expect(result.lines).toHaveLength(1);
		expect(result.lines[0]).toMatchObject({
			sku: 'SLV-PBL-20',
			fullCartons: 20,
			remainderUnits: 10,
			cartons: 21,
			firstCarton: 1,
			lastCarton: 21
		});
		// Full carton 8.640 kg; the part-filled one 8.640 − 12 × 0.62 + 10 × 0.62 = 7.400 kg;
		// 20 × 8.640 + 7.400 = 180.200 kg. Volume 21 × 0.4 × 0.3 × 0.25 m = 21 × 0.03 = 0.63 m³.
		expect(result.totals).toEqual({
			units: 250,
			cartons: 21,
			netKg: '155.000',
			grossKg: '180.200',
			volumeM3: '0.630000'
		});
		expect(result.pallets).toBeNull();
	});

	it('refuses to measure a line of SLV-HUB-01, whose packaging is not recorded', async () => {
		const { id } = await create();
		ok(
			await setLines(id, [
				{ sku: 'SLV-PBL-20', quantity: 24 },
				{ sku: 'SLV-HUB-01', quantity: 40 }
			]),
			'replaceLines'
		);
		const measured = await measureShipment(coordinator, id);
		expect(measured).not.toBeNull();
		expect(measured!.shipment.lines.map((l) => l.hasPackaging)).toEqual([true, false]);
		const result = measured!.result;
		expect(result.ok).toBe(false);
		expect(result.problems.length).toBeGreaterThan(0);
		expect(result.problems.some((p) => /packaging/i.test(p.message))).toBe(true);
		expect(result.problems.map((p) => p.message).join(' ')).toContain('SLV-HUB-01');
	});

	it('answers null for a shipment that does not exist', async () => {
		expect(await measureShipment(coordinator, MISSING_ID)).toBeNull();
	});
});

describe('changeStatus', () => {
	it('refuses draft → booked without lines or a chosen mode, and says what is missing', async () => {
		const { id } = await create({ chosenMode: '' });
		const both = refused(await moveTo(id, 'booked'));
		expect(both.status).toBe(400);
		expect(both.message).toContain('at least one line');
		expect(both.message).toContain('chosen mode');

		ok(await setLines(id, [{ sku: 'SLV-PBL-20', quantity: 12 }]), 'replaceLines');
		const modeOnly = refused(await moveTo(id, 'booked'));
		expect(modeOnly.message).toContain('chosen mode');
		expect(modeOnly.message).not.toContain('line');

		const { id: noLines } = await create({ chosenMode: 'air' });
		const linesOnly = refused(await moveTo(noLines, 'booked'));
		expect(linesOnly.message).toContain('at least one line');
		expect(linesOnly.message).not.toContain('mode');

		for (const shipmentId of [id, noLines]) {
			expect(await statusOf(shipmentId)).toBe('draft');
			expect(await statusEvents(shipmentId)).toHaveLength(1);
		}
	});

	it('moves draft → booked → documents_issued, each step a status event with the actor', async () => {
		const { id } = await create({ consigneeId: hallvikConsignee });
		ok(await setLines(id, [{ sku: 'SLV-PBL-20', quantity: 24 }]), 'replaceLines');
		expect(ok(await moveTo(id, 'booked', coordinator, 'Space confirmed'), 'book')).toEqual({
			id,
			status: 'booked'
		});
		// Straight to "documents issued" is refused until the papers exist.
		expect(refused(await moveTo(id, 'documents_issued')).message).toMatch(/Issue the commercial/);
		await issueBoth(id);
		expect(await statusOf(id)).toBe('documents_issued');
		const events = await statusEvents(id);
		expect(events.map((e) => [e.fromStatus, e.toStatus, e.actorUserId])).toEqual([
			[null, 'draft', coordinator.id],
			['draft', 'booked', coordinator.id],
			['booked', 'documents_issued', coordinator.id]
		]);
		expect(events[1]!.note).toBe('Space confirmed');
		// Booking queues one confirmation per customer user of Hallvik, in the same transaction.
		const confirmations = await sequelize.query<{ recipient: string; text: string }>(
			`SELECT recipient, text FROM mail_outbox WHERE dedupe_key LIKE :key`,
			{ type: QueryTypes.SELECT, replacements: { key: `booking_confirmed:${id}:%` } }
		);
		expect(confirmations.map((c) => c.recipient)).toEqual(['buyer@hallvik.example']);
		expect(confirmations[0]!.text).toContain(`/shipments/${id}`);
		expect(events[2]!.note).toMatch(/^Issued CI-\d{4}-\d{5} rev\. A, PL-\d{4}-\d{5} rev\. A$/);
		const audit = (await auditEvents(id)).filter((a) => a.action === 'shipment.status');
		expect(audit.map((a) => [a.before, a.after])).toEqual([
			[{ status: 'draft' }, { status: 'booked', note: 'Space confirmed' }]
		]);
		expect((await auditEvents(id)).map((a) => a.action)).toContain('documents.issue');
		// The detail page shows the history with the actor's name.
		const detail = await getShipment(coordinator, id);
		expect(detail!.statusEvents.map((e) => [e.toStatus, e.actorName])).toEqual([
			['draft', coordinator.name],
			['booked', coordinator.name],
			['documents_issued', coordinator.name]
		]);
	});

	it('refuses a jump that skips steps (draft → delivered) and changes nothing', async () => {
		const { id } = await create();
		ok(await setLines(id, [{ sku: 'SLV-PBL-20', quantity: 12 }]), 'replaceLines');
		const version = await versionOf(id);
		const result = refused(await moveTo(id, 'delivered'));
		expect(result.status).toBe(400);
		expect(result.message).toMatch(/draft to delivered/);
		expect(result.fieldErrors).toHaveProperty('to');
		expect(await statusOf(id)).toBe('draft');
		expect(await versionOf(id)).toBe(version);
		expect(await statusEvents(id)).toHaveLength(1);
	});

	it('answers 409 for a stale version', async () => {
		const { id } = await create();
		ok(await setLines(id, [{ sku: 'SLV-PBL-20', quantity: 12 }]), 'replaceLines');
		const result = refused(
			await changeStatus(
				coordinator,
				id,
				statusChangeSchema.parse({ to: 'booked', version: 0 }),
				IP
			)
		);
		expect(result.status).toBe(409);
		expect(await statusOf(id)).toBe('draft');
	});

	it('freezes the lines once the documents are issued, until it goes back to booked', async () => {
		const { id } = await create({ consigneeId: hallvikConsignee });
		ok(await setLines(id, [{ sku: 'SLV-PBL-20', quantity: 24 }]), 'replaceLines');
		ok(await moveTo(id, 'booked'), 'book');
		ok(await setLines(id, [{ sku: 'SLV-PBL-20', quantity: 36 }]), 'replaceLines while booked');
		await issueBoth(id);
		const before = await storedLines(id);
		const version = await versionOf(id);

		const frozen = refused(await setLines(id, [{ sku: 'SLV-PBL-20', quantity: 48 }]));
		expect(frozen.status).toBe(409);
		expect(frozen.message).toContain('documents issued');
		expect(await storedLines(id)).toEqual(before);
		expect(await versionOf(id)).toBe(version);

		const header = refused(
			await updateShipment(coordinator, id, shipmentInput({ notes: 'late change', version }), IP)
		);
		expect(header.status).toBe(409);

		ok(await moveTo(id, 'booked', coordinator, 'Correct the quantity'), 'step back');
		ok(await setLines(id, [{ sku: 'SLV-PBL-20', quantity: 48 }]), 'replaceLines after step back');
		expect((await storedLines(id)).map((l) => l.quantity)).toEqual([48]);
	});
});

describe('addContainer', () => {
	// ISO 6346:1995, Annex A (check digit), worked example CSQU 305438 3.
	it('containerSchema accepts CSQU3054383 and normalises spacing and case', () => {
		const parsed = containerSchema.parse({ containerNumber: 'CSQU3054383', version: 0 });
		expect(parsed.containerNumber).toBe('CSQU3054383');
		expect(containerSchema.parse({ containerNumber: ' csqu 305438-3 ', version: 0 })).toMatchObject(
			{ containerNumber: 'CSQU3054383' }
		);
	});

	// ISO 6346:1995, Annex A: CSQU305438 has check digit 3, so 4 is wrong.
	it('containerSchema rejects CSQU3054384 with a message naming the right check digit', () => {
		const result = containerSchema.safeParse({ containerNumber: 'CSQU3054384', version: 0 });
		expect(result.success).toBe(false);
		const issue = result.error!.issues.find((i) => i.path.join('.') === 'containerNumber');
		expect(issue?.message).toBe('The check digit should be 3, not 4.');
	});

	it('adds a container and refuses the same container again on the shipment', async () => {
		const { id } = await create();
		const input = containerSchema.parse({
			containerNumber: 'CSQU 305438 3',
			containerTypeId,
			sealNumber: 'LF-SEAL-0001',
			version: await versionOf(id)
		});
		const added = ok(await addContainer(coordinator, id, input, IP), 'addContainer');
		const detail = await getShipment(coordinator, id);
		expect(detail!.containers).toEqual([
			expect.objectContaining({
				id: added.id,
				containerNumber: 'CSQU3054383',
				sealNumber: 'LF-SEAL-0001'
			})
		]);
		expect(detail!.containers[0]!.containerType).not.toBeNull();
		expect(await versionOf(id)).toBe(1);

		const again = containerSchema.parse({
			containerNumber: 'csqu3054383',
			version: await versionOf(id)
		});
		const duplicate = refused(await addContainer(coordinator, id, again, IP));
		expect(duplicate.status).toBe(400);
		expect(duplicate.fieldErrors).toHaveProperty('containerNumber');
		expect(await ShipmentContainer.count({ where: { shipmentId: id } })).toBe(1);
		expect(await versionOf(id)).toBe(1);
	});

	it('lets the same container be on two different shipments', async () => {
		const a = await create();
		const b = await create();
		for (const { id } of [a, b]) {
			const input = containerSchema.parse({ containerNumber: 'CSQU3054383', version: 0 });
			ok(await addContainer(coordinator, id, input, IP), 'addContainer');
		}
	});
});

describe('scoping of a Hallvik shipment', () => {
	let hallvik: { id: string; reference: string };
	let tag: string;

	beforeAll(async () => {
		tag = `LFQ${uniqueSuffix()}`;
		hallvik = await create({ bookingNumber: `${tag}-H` });
		ok(await setLines(hallvik.id, [{ sku: 'SLV-PBL-20', quantity: 24 }]), 'replaceLines');
	});

	const listIds = async (user: SessionUser) =>
		(await listShipments(user, query({ q: tag }))).rows.map((r) => r.id);

	it('is visible to the coordinator and to Hallvik’s buyer', async () => {
		for (const user of [coordinator, hallvikBuyer]) {
			const detail = await getShipment(user, hallvik.id);
			expect(detail, user.email).not.toBeNull();
			expect(detail!.reference).toBe(hallvik.reference);
			expect(detail!.customer?.id).toBe(org.hallvik);
			expect(await listIds(user)).toEqual([hallvik.id]);
			expect(await measureShipment(user, hallvik.id)).not.toBeNull();
		}
	});

	it('is invisible to Wattlebird’s buyer, as if it did not exist', async () => {
		expect(await getShipment(wattlebirdBuyer, hallvik.id)).toBeNull();
		expect(await listIds(wattlebirdBuyer)).toEqual([]);
		const all = await listShipments(wattlebirdBuyer, query({ pageSize: 200 }));
		expect(all.rows.map((r) => r.id)).not.toContain(hallvik.id);
		expect(await measureShipment(wattlebirdBuyer, hallvik.id)).toBeNull();
	});

	it('refuses Wattlebird’s buyer (403: customers never change shipments) for replaceLines, changeStatus and addContainer', async () => {
		const version = await versionOf(hallvik.id);
		const lines = refused(
			await replaceLines(
				wattlebirdBuyer,
				hallvik.id,
				linesInput([{ sku: 'SLV-TWR-80', quantity: 1 }], version),
				IP
			)
		);
		expect(lines.status).toBe(403);
		const status = refused(
			await changeStatus(
				wattlebirdBuyer,
				hallvik.id,
				statusChangeSchema.parse({ to: 'cancelled', version }),
				IP
			)
		);
		expect(status.status).toBe(403);
		const container = refused(
			await addContainer(
				wattlebirdBuyer,
				hallvik.id,
				containerSchema.parse({ containerNumber: 'CSQU3054383', version }),
				IP
			)
		);
		expect(container.status).toBe(403);
		// Nothing changed.
		expect(await versionOf(hallvik.id)).toBe(version);
		expect(await statusOf(hallvik.id)).toBe('draft');
		expect((await storedLines(hallvik.id)).map((l) => l.quantity)).toEqual([24]);
	});

	it('is visible to the broker only once its firm is set as the shipment’s broker', async () => {
		expect(await getShipment(broker, hallvik.id)).toBeNull();
		expect(await listIds(broker)).toEqual([]);
		expect(await measureShipment(broker, hallvik.id)).toBeNull();

		const version = await versionOf(hallvik.id);
		ok(
			await updateShipment(
				coordinator,
				hallvik.id,
				shipmentInput({ bookingNumber: `${tag}-H`, brokerId: org.broker, version }),
				IP
			),
			'updateShipment'
		);
		const detail = await getShipment(broker, hallvik.id);
		expect(detail).not.toBeNull();
		expect(detail!.broker).toEqual({ id: org.broker, name: 'Kaaiman Customs Services B.V.' });
		expect(await listIds(broker)).toEqual([hallvik.id]);
		expect(await measureShipment(broker, hallvik.id)).not.toBeNull();
		// Wattlebird's buyer still does not see it.
		expect(await getShipment(wattlebirdBuyer, hallvik.id)).toBeNull();
	});
});

describe('listShipments', () => {
	// Four shipments of this file's own, told apart from everyone else's by the tag in their
	// booking numbers; every query below includes q = tag (or a longer string starting with it).
	let tag: string;
	const s: { id: string; reference: string }[] = [];

	beforeAll(async () => {
		tag = `LFQ${uniqueSuffix()}`;
		s.push(
			await create({ bookingNumber: `${tag}-01`, chosenMode: 'sea_fcl', etd: '2031-03-01' }),
			await create({ bookingNumber: `${tag}-02`, chosenMode: 'air', etd: '2031-03-15' }),
			await create({
				customerId: org.wattlebird,
				destinationId: placeId('AUMEL'),
				bookingNumber: `${tag}_A%1`,
				chosenMode: 'sea_fcl',
				etd: '2031-04-01'
			}),
			await create({
				customerId: org.wattlebird,
				destinationId: placeId('AUMEL'),
				bookingNumber: `${tag}XA51`,
				modesConsidered: ['road'],
				chosenMode: ''
			})
		);
		ok(await setLines(s[1]!.id, [{ sku: 'SLV-PBL-20', quantity: 12 }]), 'replaceLines');
		ok(await moveTo(s[1]!.id, 'booked'), 'book');
	});

	const ids = (...indexes: number[]) => indexes.map((i) => s[i]!.id);
	const listed = async (input: Partial<z.input<typeof shipmentListQuerySchema>>) => {
		const result = await listShipments(
			coordinator,
			query({ sort: 'reference', dir: 'asc', ...input })
		);
		return { ...result, ids: result.rows.map((r) => r.id) };
	};

	it('finds exactly this file’s four shipments by the tag, with their list columns', async () => {
		const result = await listed({ q: tag });
		expect(result.total).toBe(4);
		expect(result.ids).toEqual(ids(0, 1, 2, 3));
		expect(result.rows[1]).toMatchObject({
			reference: s[1]!.reference,
			status: 'booked',
			customerName: 'Hallvik Heimtechnik GmbH',
			originCode: 'MYPKG',
			destinationCode: 'DEHAM',
			chosenMode: 'air',
			etd: '2031-03-15',
			lineCount: 1
		});
		expect(result.rows[3]).toMatchObject({ chosenMode: null, etd: null, lineCount: 0 });
	});

	it('filters by status', async () => {
		expect((await listed({ q: tag, status: 'booked' })).ids).toEqual(ids(1));
		expect((await listed({ q: tag, status: 'draft' })).ids).toEqual(ids(0, 2, 3));
		expect((await listed({ q: tag, status: 'delivered' })).total).toBe(0);
	});

	it('filters by customer', async () => {
		expect((await listed({ q: tag, customerId: org.wattlebird })).ids).toEqual(ids(2, 3));
		expect((await listed({ q: tag, customerId: org.hallvik })).ids).toEqual(ids(0, 1));
	});

	it('filters by chosen mode', async () => {
		expect((await listed({ q: tag, mode: 'sea_fcl' })).ids).toEqual(ids(0, 2));
		expect((await listed({ q: tag, mode: 'air' })).ids).toEqual(ids(1));
		expect((await listed({ q: tag, mode: 'road' })).ids).toEqual([]);
	});

	it('filters by a date range on ETD, both ends included; no ETD is outside any range', async () => {
		expect((await listed({ q: tag, from: '2031-03-01', to: '2031-03-31' })).ids).toEqual(ids(0, 1));
		expect((await listed({ q: tag, from: '2031-03-15' })).ids).toEqual(ids(1, 2));
		expect((await listed({ q: tag, to: '2031-03-01' })).ids).toEqual(ids(0));
		expect((await listed({ q: tag, from: '2031-04-02' })).ids).toEqual([]);
	});

	it('finds a shipment by a substring of its reference', async () => {
		const q = s[2]!.reference.slice(4); // 'YYYY-NNNNN' without 'SHP-'
		const result = await listed({ q });
		expect(result.ids).toContain(s[2]!.id);
		expect(result.rows.every((r) => r.reference.includes(q))).toBe(true);
	});

	it('sorts by reference ascending and descending', async () => {
		const asc = await listed({ q: tag, sort: 'reference', dir: 'asc' });
		const desc = await listed({ q: tag, sort: 'reference', dir: 'desc' });
		const references = s.map((x) => x.reference);
		const sorted = [...references].sort();
		expect(asc.rows.map((r) => r.reference)).toEqual(sorted);
		expect(desc.rows.map((r) => r.reference)).toEqual([...sorted].reverse());
		// Created one after the other, so numbered in that order.
		expect(sorted).toEqual(references);
	});

	it('pages: pageSize 2 gives the total and 2 rows a page, without overlap', async () => {
		const page1 = await listed({ q: tag, pageSize: 2, page: 1 });
		const page2 = await listed({ q: tag, pageSize: 2, page: 2 });
		const page3 = await listed({ q: tag, pageSize: 2, page: 3 });
		expect(page1).toMatchObject({ total: 4, page: 1, pageSize: 2 });
		expect(page1.ids).toEqual(ids(0, 1));
		expect(page2.ids).toEqual(ids(2, 3));
		expect(page2.total).toBe(4);
		expect(page3.ids).toEqual([]);
		expect(page3.total).toBe(4);
	});

	it('treats % and _ in q literally', async () => {
		// As LIKE wildcards, `${tag}_A%` would also match `${tag}XA51`, and `${tag}_` all four.
		expect((await listed({ q: `${tag}_A%` })).ids).toEqual(ids(2));
		expect((await listed({ q: `${tag}_` })).ids).toEqual(ids(2));
		expect((await listed({ q: `${tag}%` })).ids).toEqual([]);
		expect((await listed({ q: `${tag}\\` })).ids).toEqual([]);
	});

	it('scopes the list: each customer sees its own, the broker none of these', async () => {
		const as = async (user: SessionUser) =>
			(await listShipments(user, query({ q: tag, sort: 'reference', dir: 'asc' }))).rows.map(
				(r) => r.id
			);
		expect(await as(hallvikBuyer)).toEqual(ids(0, 1));
		expect(await as(wattlebirdBuyer)).toEqual(ids(2, 3));
		expect(await as(broker)).toEqual([]);
		const counted = await listShipments(hallvikBuyer, query({ q: tag, pageSize: 1 }));
		expect(counted.total).toBe(2);
	});
});
