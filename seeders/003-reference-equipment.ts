import { QueryTypes, type Sequelize } from 'sequelize';
import { containerTypes, palletTypes } from '../src/lib/reference/equipment';

// Reference data from data/*.json (with its sources), upserted by code so later data fixes apply,
// but only to rows nobody has edited in Landfall (version 0): a user's edit is never overwritten.
const sourceNote = (sources: Record<string, string>) =>
	Object.entries(sources)
		.map(([field, note]) => `${field}: ${note}`)
		.join('\n');

const PALLET_SQL = `
	INSERT INTO pallet_types (code, name, length_mm, width_mm, deck_height_mm, tare_kg, max_gross_kg,
	                          max_loaded_height_mm, source_note)
	VALUES (:code, :name, :lengthMm, :widthMm, :deckHeightMm, :tareKg, :maxGrossKg,
	        :maxLoadedHeightMm, :sourceNote)
	ON CONFLICT (code) DO UPDATE SET
		name = EXCLUDED.name, length_mm = EXCLUDED.length_mm, width_mm = EXCLUDED.width_mm,
		deck_height_mm = EXCLUDED.deck_height_mm, tare_kg = EXCLUDED.tare_kg,
		max_gross_kg = EXCLUDED.max_gross_kg, max_loaded_height_mm = EXCLUDED.max_loaded_height_mm,
		source_note = EXCLUDED.source_note, updated_at = now()
	WHERE pallet_types.version = 0 AND NOT pallet_types.custom`;

const CONTAINER_SQL = `
	INSERT INTO container_types (code, name, iso668_designation, iso6346_size_type,
	                             internal_length_mm, internal_width_mm, internal_height_mm,
	                             door_width_mm, door_height_mm, tare_kg, max_gross_kg, max_payload_kg,
	                             source_note)
	VALUES (:code, :name, :iso668Designation, :iso6346SizeType, :internalLengthMm, :internalWidthMm,
	        :internalHeightMm, :doorWidthMm, :doorHeightMm, :tareKg, :maxGrossKg, :maxPayloadKg,
	        :sourceNote)
	ON CONFLICT (code) DO UPDATE SET
		name = EXCLUDED.name, iso668_designation = EXCLUDED.iso668_designation,
		iso6346_size_type = EXCLUDED.iso6346_size_type,
		internal_length_mm = EXCLUDED.internal_length_mm,
		internal_width_mm = EXCLUDED.internal_width_mm,
		internal_height_mm = EXCLUDED.internal_height_mm, door_width_mm = EXCLUDED.door_width_mm,
		door_height_mm = EXCLUDED.door_height_mm, tare_kg = EXCLUDED.tare_kg,
		max_gross_kg = EXCLUDED.max_gross_kg, max_payload_kg = EXCLUDED.max_payload_kg,
		source_note = EXCLUDED.source_note, updated_at = now()
	WHERE container_types.version = 0 AND NOT container_types.custom`;

export async function seed(sequelize: Sequelize): Promise<void> {
	await sequelize.transaction(async (transaction) => {
		for (const p of palletTypes) {
			await sequelize.query(PALLET_SQL, {
				transaction,
				type: QueryTypes.INSERT,
				replacements: {
					code: p.code,
					name: p.name,
					lengthMm: p.lengthMm,
					widthMm: p.widthMm,
					deckHeightMm: p.heightMm,
					tareKg: p.tareKg,
					maxGrossKg: p.maxGrossKg,
					maxLoadedHeightMm: p.maxLoadedHeightMm,
					sourceNote: sourceNote(p.sources)
				}
			});
		}
		for (const c of containerTypes) {
			await sequelize.query(CONTAINER_SQL, {
				transaction,
				type: QueryTypes.INSERT,
				replacements: {
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
				}
			});
		}
	});
}
