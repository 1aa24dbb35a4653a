import { Op } from 'sequelize';
import { ContainerTypeRow, Organization, PalletTypeRow, Party, Place } from '../db/models';
import { listProducts } from './products';

/**
 * Choices for the shipment forms: organizations, parties, places, equipment, products. Retired
 * places and parties are left out, except those in `keep` (what the shipment already names).
 */
export async function shipmentFormOptions(keep: (string | null)[] = []) {
	const current = { [Op.or]: [{ active: true }, { id: keep.filter((id) => id !== null) }] };
	const [organizations, parties, places, palletTypes, containerTypes, products] = await Promise.all(
		[
			Organization.findAll({
				attributes: ['id', 'name', 'kind'],
				order: [['name', 'ASC']],
				raw: true
			}),
			Party.findAll({
				attributes: ['id', 'name', 'city', 'countryCode'],
				where: current,
				order: [['name', 'ASC']],
				raw: true
			}),
			Place.findAll({
				attributes: ['id', 'code', 'name', 'kind'],
				where: current,
				order: [['code', 'ASC']],
				raw: true
			}),
			PalletTypeRow.findAll({ order: [['code', 'ASC']], raw: true }),
			ContainerTypeRow.findAll({
				attributes: ['id', 'code', 'name'],
				order: [['code', 'ASC']],
				raw: true
			}),
			listProducts()
		]
	);
	return {
		customers: organizations
			.filter((o) => o.kind === 'customer')
			.map(({ id, name }) => ({ id, name })),
		brokers: organizations.filter((o) => o.kind === 'broker').map(({ id, name }) => ({ id, name })),
		parties: parties.map((p) => ({ id: p.id, name: `${p.name} (${p.city}, ${p.countryCode})` })),
		places: places.map((p) => ({ id: p.id, name: `${p.code} — ${p.name}` })),
		palletTypes: palletTypes.map((p) => ({
			id: p.id,
			code: p.code,
			name: p.name,
			lengthMm: p.lengthMm,
			widthMm: p.widthMm,
			deckHeightMm: p.deckHeightMm,
			tareKg: p.tareKg,
			maxGrossKg: p.maxGrossKg,
			maxLoadedHeightMm: p.maxLoadedHeightMm
		})),
		containerTypes: containerTypes.map(({ id, code, name }) => ({ id, code, name })),
		products: products.map((p) => ({
			id: p.id,
			sku: p.sku,
			description: p.description,
			unitPrice: p.unitPrice,
			currency: p.currency,
			netKgPerUnit: p.netKgPerUnit,
			packaging: p.packaging
		}))
	};
}
export type ShipmentFormOptions = Awaited<ReturnType<typeof shipmentFormOptions>>;
