import type { Sequelize } from 'sequelize';
import { ContainerTypeRow, PalletTypeRow } from '../src/lib/server/db/models';
import { containerTypes, palletTypes } from '../src/lib/reference/equipment';

// Reference data from data/*.json (with its sources); upserted by code so later data fixes apply.
const sourceNote = (sources: Record<string, string>) =>
	Object.entries(sources)
		.map(([field, note]) => `${field}: ${note}`)
		.join('\n');

export async function seed(sequelize: Sequelize): Promise<void> {
	await sequelize.transaction(async (transaction) => {
		for (const p of palletTypes) {
			await PalletTypeRow.upsert(
				{
					code: p.code,
					name: p.name,
					lengthMm: p.lengthMm,
					widthMm: p.widthMm,
					deckHeightMm: p.heightMm,
					tareKg: p.tareKg,
					maxGrossKg: p.maxGrossKg,
					maxLoadedHeightMm: p.maxLoadedHeightMm,
					sourceNote: sourceNote(p.sources)
				},
				{ transaction, conflictFields: ['code'] }
			);
		}
		for (const c of containerTypes) {
			await ContainerTypeRow.upsert(
				{
					code: c.code,
					name: c.name,
					iso668Designation: c.iso668Designation,
					iso6346SizeType: c.iso6346SizeType,
					internalLengthMm: c.internal.lengthMm,
					internalWidthMm: c.internal.widthMm,
					internalHeightMm: c.internal.heightMm,
					doorWidthMm: c.doorOpening.widthMm,
					doorHeightMm: c.doorOpening.heightMm,
					tareKg: c.tareKg,
					maxGrossKg: c.maxGrossKg,
					maxPayloadKg: c.maxPayloadKg,
					sourceNote: sourceNote(c.sources)
				},
				{ transaction, conflictFields: ['code'] }
			);
		}
	});
}
