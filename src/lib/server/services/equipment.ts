import Decimal from 'decimal.js';
import { UniqueConstraintError } from 'sequelize';
import { payloadKg, type ContainerTypeInput, type PalletTypeInput } from '../../schemas/equipment';
import { canEditMasterData } from '../../roles';
import type { SessionUser } from '../auth/session-user';
import { ContainerTypeRow, PalletTypeRow, type AuditJson } from '../db/models';
import { recordAudit } from './audit';
import { invalid, refused, type ServiceResult } from './result';
import { bumpVersion } from './versioned';

// Pallet and container types. Reference types (from data/*.json) keep their code, footprint and
// ISO designations; their figures may be edited, and the seeder then leaves them alone. Custom
// types are added here and editable throughout.

export async function listEquipment() {
	const [palletTypes, containerTypes] = await Promise.all([
		PalletTypeRow.findAll({ order: [['code', 'ASC']], raw: true }),
		ContainerTypeRow.findAll({ order: [['code', 'ASC']], raw: true })
	]);
	return { palletTypes, containerTypes };
}

export const getPalletType = (id: string) => PalletTypeRow.findByPk(id, { raw: true });
export const getContainerType = (id: string) => ContainerTypeRow.findByPk(id, { raw: true });

const notAllowed = () =>
	refused(403, 'Only coordinators and administrators change pallet and container types.');
const duplicate = () => invalid({ code: 'Another type already has this code.' });
const ENTERED = 'entered in Landfall';

/** Runs the add or edit in one transaction with its audit event; a taken code is a field error. */
async function save<Row extends PalletTypeRow | ContainerTypeRow>(
	actor: SessionUser,
	model: typeof PalletTypeRow | typeof ContainerTypeRow,
	what: 'pallet type' | 'container type',
	id: string | null,
	version: number,
	fields: (existing: Row | null) => Record<string, unknown>,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!canEditMasterData(actor.role)) return notAllowed();
	const table = model === PalletTypeRow ? 'pallet_types' : 'container_types';
	const entity = table.slice(0, -1);
	try {
		return await model.sequelize!.transaction(async (transaction) => {
			let existing: Row | null = null;
			if (id) {
				existing = (await (model as typeof PalletTypeRow).findByPk(id, {
					raw: true,
					transaction
				})) as Row | null;
				const problem = await bumpVersion(table, id, version, what, transaction);
				if (problem) return problem;
			}
			const values = fields(existing);
			let savedId = id;
			if (id) {
				await (model as typeof PalletTypeRow).update(values, {
					where: { id },
					transaction,
					silent: true
				});
			} else {
				const created = await (model as typeof PalletTypeRow).create(
					{ ...values, custom: true, sourceNote: ENTERED } as never,
					{ transaction }
				);
				savedId = created.id;
			}
			await recordAudit(
				{
					actorUserId: actor.id,
					action: `${entity}.${id ? 'update' : 'create'}`,
					entity,
					entityId: savedId,
					before: existing as unknown as AuditJson,
					after: values,
					ip
				},
				transaction
			);
			return { ok: true as const, value: { id: savedId! } };
		});
	} catch (error) {
		if (error instanceof UniqueConstraintError) return duplicate();
		throw error;
	}
}

/** Adds (id null) or edits a pallet type. A reference type keeps its code and footprint. */
export function savePalletType(
	actor: SessionUser,
	id: string | null,
	input: PalletTypeInput,
	ip: string | null
) {
	return save<PalletTypeRow>(
		actor,
		PalletTypeRow,
		'pallet type',
		id,
		input.version,
		(existing) => {
			const fixed = existing && !existing.custom;
			return {
				code: fixed ? existing.code : input.code,
				name: input.name,
				lengthMm: fixed ? existing.lengthMm : Number(input.lengthMm),
				widthMm: fixed ? existing.widthMm : Number(input.widthMm),
				deckHeightMm: Number(input.deckHeightMm),
				tareKg: input.tareKg,
				maxGrossKg: input.maxGrossKg,
				maxLoadedHeightMm: Number(input.maxLoadedHeightMm)
			};
		},
		ip
	);
}

/** Adds (id null) or edits a container type; the payload is always gross − tare (decimal.js). */
export function saveContainerType(
	actor: SessionUser,
	id: string | null,
	input: ContainerTypeInput,
	ip: string | null
) {
	return save<ContainerTypeRow>(
		actor,
		ContainerTypeRow,
		'container type',
		id,
		input.version,
		(existing) => {
			const fixed = existing && !existing.custom;
			return {
				code: fixed ? existing.code : input.code,
				name: input.name,
				iso668Designation: fixed ? existing.iso668Designation : input.iso668Designation,
				iso6346SizeType: fixed ? existing.iso6346SizeType : input.iso6346SizeType,
				internalLengthMm: Number(input.internalLengthMm),
				internalWidthMm: Number(input.internalWidthMm),
				internalHeightMm: Number(input.internalHeightMm),
				doorWidthMm: Number(input.doorWidthMm),
				doorHeightMm: Number(input.doorHeightMm),
				tareKg: input.tareKg,
				maxGrossKg: input.maxGrossKg,
				maxPayloadKg: payloadKg(input.tareKg, input.maxGrossKg)!
			};
		},
		ip
	);
}

// NUMERIC comes back as "25.000": the forms show "25".
const plain = (kg: string) => new Decimal(kg).toFixed();

/** A stored pallet type as the edit form holds it. */
export function palletFormValues(row: PalletTypeRow): PalletTypeInput {
	return {
		code: row.code,
		name: row.name,
		lengthMm: String(row.lengthMm),
		widthMm: String(row.widthMm),
		deckHeightMm: String(row.deckHeightMm),
		tareKg: plain(row.tareKg),
		maxGrossKg: plain(row.maxGrossKg),
		maxLoadedHeightMm: String(row.maxLoadedHeightMm),
		version: row.version
	};
}

/** A stored container type as the edit form holds it. */
export function containerFormValues(row: ContainerTypeRow): ContainerTypeInput {
	return {
		code: row.code,
		name: row.name,
		iso668Designation: row.iso668Designation,
		iso6346SizeType: row.iso6346SizeType,
		internalLengthMm: String(row.internalLengthMm),
		internalWidthMm: String(row.internalWidthMm),
		internalHeightMm: String(row.internalHeightMm),
		doorWidthMm: String(row.doorWidthMm),
		doorHeightMm: String(row.doorHeightMm),
		tareKg: plain(row.tareKg),
		maxGrossKg: plain(row.maxGrossKg),
		version: row.version
	};
}
