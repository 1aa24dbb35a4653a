// Editing places, parties, pallet and container types: optimistic locking, refused removal of
// what shipments name, retiring, validation and role checks, each with its audit event.
import { Op } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { containerTypeInputSchema, palletTypeInputSchema } from '$lib/schemas/equipment';
import { partySchema, placeSchema } from '$lib/schemas/master-data';
import { ContainerTypeRow, PalletTypeRow, Party, Place, Shipment } from '$lib/server/db/models';
import {
	containerFormValues,
	palletFormValues,
	saveContainerType,
	savePalletType
} from '$lib/server/services/equipment';
import {
	getPlace,
	removeRecord,
	saveParty,
	savePlace,
	setActive,
	shipmentsUsing
} from '$lib/server/services/master-data';
import { shipmentFormOptions } from '$lib/server/services/shipment-options';
import { countRows, sessionUserFor, uniqueSuffix } from './db';

const coordinator = () => sessionUserFor('coordinator@solvrae.example');
const finance = () => sessionUserFor('finance@solvrae.example');

/** A place code of the test's own: NL + 3 random letters (UN/LOCODE shape, country NL). */
function ownCode(): string {
	const letters = Array.from({ length: 3 }, () => String.fromCharCode(65 + Math.random() * 26));
	return `NL${letters.join('')}`;
}

async function ownPlace() {
	const code = ownCode();
	const input = placeSchema.parse({ code, name: 'Itest quay', kind: 'inland', countryCode: 'NL' });
	const result = await savePlace(await coordinator(), null, input, null);
	if (!result.ok) throw new Error(result.message);
	return { id: result.value.id, code, input };
}

describe('places', () => {
	it('edits a place, bumps its version and records the change', async () => {
		const { id, input } = await ownPlace();
		const saved = await savePlace(await coordinator(), id, { ...input, name: 'Renamed' }, null);
		expect(saved.ok).toBe(true);
		const place = await getPlace(id);
		expect(place).toMatchObject({ name: 'Renamed', version: 1 });
		expect(
			await countRows('audit_events', "entity_id = :id AND action = 'place.update'", { id })
		).toBe(1);
		await Place.destroy({ where: { id } });
	});

	it('refuses a stale version with 409 and leaves the row alone', async () => {
		const { id, input } = await ownPlace();
		const user = await coordinator();
		expect((await savePlace(user, id, { ...input, name: 'First', version: 0 }, null)).ok).toBe(
			true
		);
		const stale = await savePlace(user, id, { ...input, name: 'Second', version: 0 }, null);
		expect(stale).toMatchObject({ ok: false, status: 409 });
		expect((await getPlace(id))?.name).toBe('First');
		await Place.destroy({ where: { id } });
	});

	it('refuses finance: only coordinators and administrators change places', async () => {
		const { id, input } = await ownPlace();
		expect(await savePlace(await finance(), id, input, null)).toMatchObject({ status: 403 });
		expect(await removeRecord(await finance(), 'place', id, 0, null)).toMatchObject({
			status: 403
		});
		expect(await Place.count({ where: { id } })).toBe(1);
		await Place.destroy({ where: { id } });
	});

	it('removes an unused place, with an audit event', async () => {
		const { id } = await ownPlace();
		expect(await removeRecord(await coordinator(), 'place', id, 0, null)).toMatchObject({
			ok: true
		});
		expect(await Place.count({ where: { id } })).toBe(0);
		expect(
			await countRows('audit_events', "entity_id = :id AND action = 'place.remove'", { id })
		).toBe(1);
	});

	it('refuses to remove a place a shipment names, and says which shipments', async () => {
		const shipment = (await Shipment.findOne({ order: [['reference', 'ASC']] }))!;
		const usage = await shipmentsUsing('place', shipment.originId);
		expect(usage.count).toBeGreaterThan(0);
		const place = (await Place.findByPk(shipment.originId))!;
		const refused = await removeRecord(await coordinator(), 'place', place.id, place.version, null);
		expect(refused).toMatchObject({ ok: false, status: 409 });
		if (refused.ok) return;
		expect(refused.message).toContain(`${usage.count} shipment`);
		expect(refused.message).toContain(usage.shipments[0]!.reference);
		expect(refused.message).toContain('Retire it instead');
		expect(await Place.count({ where: { id: place.id } })).toBe(1);
	});

	it('a retired place is not offered for new shipments but stays for the one naming it', async () => {
		const { id } = await ownPlace();
		const user = await coordinator();
		expect((await setActive(user, 'place', id, 0, false, null)).ok).toBe(true);
		expect((await shipmentFormOptions()).places.some((p) => p.id === id)).toBe(false);
		expect((await shipmentFormOptions([id])).places.some((p) => p.id === id)).toBe(true);
		// The version moved on: a second retire with the old version is stale.
		expect(await setActive(user, 'place', id, 0, true, null)).toMatchObject({ status: 409 });
		expect((await setActive(user, 'place', id, 1, true, null)).ok).toBe(true);
		expect((await getPlace(id))?.active).toBe(true);
		await Place.destroy({ where: { id } });
	});

	it('refuses a code that is taken, as a field error', async () => {
		const { id, input } = await ownPlace();
		const other = await ownPlace();
		const clash = await savePlace(await coordinator(), id, { ...input, code: other.code }, null);
		expect(clash).toMatchObject({ ok: false, fieldErrors: { code: expect.any(String) } });
		await Place.destroy({ where: { id: [id, other.id] } });
	});
});

describe('parties', () => {
	it('edits a party and refuses to remove a consignee named on a shipment', async () => {
		const user = await coordinator();
		const name = `Itest party ${uniqueSuffix()}`;
		const input = partySchema.parse({ name, line1: '1 Quay', city: 'Bremen', countryCode: 'DE' });
		const created = await saveParty(user, null, input, null);
		if (!created.ok) throw new Error(created.message);
		const id = created.value.id;
		const edited = await saveParty(user, id, { ...input, taxIds: 'EORI: DE1' }, null);
		expect(edited.ok).toBe(true);
		expect((await Party.findByPk(id))?.taxIds).toEqual([{ type: 'EORI', value: 'DE1' }]);
		expect((await removeRecord(user, 'party', id, 1, null)).ok).toBe(true);

		const named = (await Shipment.findOne({ where: { consigneeId: { [Op.ne]: null } } }))!;
		const consignee = (await Party.findByPk(named.consigneeId!))!;
		expect(await removeRecord(user, 'party', consignee.id, consignee.version, null)).toMatchObject({
			ok: false,
			status: 409,
			message: expect.stringContaining(named.reference)
		});
	});
});

describe('pallet and container types', () => {
	it('validates: whole positive mm, width not above length, gross above tare', () => {
		const base = {
			code: 'PX1',
			name: 'Test',
			lengthMm: '1200',
			widthMm: '800',
			deckHeightMm: '144',
			tareKg: '25',
			maxGrossKg: '1525',
			maxLoadedHeightMm: '1800'
		};
		expect(palletTypeInputSchema.safeParse(base).success).toBe(true);
		const paths = (input: Record<string, string>) =>
			palletTypeInputSchema.safeParse({ ...base, ...input }).error?.issues.map((i) => i.path[0]);
		expect(paths({ lengthMm: '1200.5' })).toEqual(['lengthMm']);
		expect(paths({ widthMm: '0' })).toEqual(['widthMm']);
		expect(paths({ widthMm: '1300' })).toEqual(['widthMm']);
		expect(paths({ maxGrossKg: '20' })).toEqual(['maxGrossKg']);
		expect(paths({ maxLoadedHeightMm: '100' })).toEqual(['maxLoadedHeightMm']);
	});

	it('refuses a door opening larger than the inside', async () => {
		const c20 = (await ContainerTypeRow.findOne({ where: { code: 'C20GP' } }))!;
		const values = containerFormValues(c20);
		const wide = containerTypeInputSchema.safeParse({ ...values, doorWidthMm: '2400' });
		expect(wide.error?.issues.map((i) => i.path[0])).toEqual(['doorWidthMm']);
		const high = containerTypeInputSchema.safeParse({ ...values, doorHeightMm: '2500' });
		expect(high.error?.issues.map((i) => i.path[0])).toEqual(['doorHeightMm']);
	});

	it('adds a custom container type, payload = gross − tare exactly, then edits it', async () => {
		const user = await coordinator();
		const code = `CX${uniqueSuffix().slice(0, 6).toUpperCase()}`;
		const input = containerTypeInputSchema.parse({
			code,
			name: 'Itest 20 ft open top',
			iso668Designation: '1CC',
			iso6346SizeType: '22U1',
			internalLengthMm: '5890',
			internalWidthMm: '2345',
			internalHeightMm: '2350',
			doorWidthMm: '2340',
			doorHeightMm: '2280',
			tareKg: '2350.5',
			maxGrossKg: '30480'
		});
		const created = await saveContainerType(user, null, input, null);
		if (!created.ok) throw new Error(created.message);
		const row = (await ContainerTypeRow.findByPk(created.value.id))!;
		expect(row).toMatchObject({ custom: true, maxPayloadKg: '28129.500' });
		const edited = await saveContainerType(user, row.id, { ...input, tareKg: '2400' }, null);
		expect(edited.ok).toBe(true);
		expect((await ContainerTypeRow.findByPk(row.id))?.maxPayloadKg).toBe('28080.000');
		expect(await saveContainerType(user, row.id, input, null)).toMatchObject({ status: 409 });
		expect(await saveContainerType(await finance(), row.id, input, null)).toMatchObject({
			status: 403
		});
		await ContainerTypeRow.destroy({ where: { id: row.id } });
	});

	it('a reference pallet type keeps its code and footprint when edited', async () => {
		const user = await coordinator();
		// A custom pallet type stands in for a seeded one so the demo rows stay as they are.
		const code = `PX${uniqueSuffix().slice(0, 6).toUpperCase()}`;
		const input = palletTypeInputSchema.parse({
			code,
			name: 'Itest pallet',
			lengthMm: '1200',
			widthMm: '800',
			deckHeightMm: '150',
			tareKg: '22',
			maxGrossKg: '1022',
			maxLoadedHeightMm: '1600'
		});
		const created = await savePalletType(user, null, input, null);
		if (!created.ok) throw new Error(created.message);
		const id = created.value.id;
		await PalletTypeRow.update({ custom: false }, { where: { id } });
		const stored = palletFormValues((await PalletTypeRow.findByPk(id))!);
		const saved = await savePalletType(
			user,
			id,
			{ ...stored, code: 'PXOTHER', lengthMm: '1300', tareKg: '24', maxGrossKg: '1024' },
			null
		);
		expect(saved.ok).toBe(true);
		expect(await PalletTypeRow.findByPk(id, { raw: true })).toMatchObject({
			code,
			lengthMm: 1200,
			tareKg: '24.000',
			version: 1
		});
		expect(
			await countRows('audit_events', "entity_id = :id AND action = 'pallet_type.update'", { id })
		).toBe(1);
		await PalletTypeRow.destroy({ where: { id } });
	});
});
