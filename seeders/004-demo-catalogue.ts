import { col, fn, where, type Sequelize } from 'sequelize';
import { Organization, Party, Place, Product, ProductPackaging } from '../src/lib/server/db/models';
import { DEMO_PARTIES, DEMO_PLACES, DEMO_PRODUCTS } from './demo-catalogue';
import { DEMO_ORGANIZATIONS } from './demo-scenario';

// Idempotent: places by code, parties by name, products by SKU; existing rows are left alone.
export async function seed(sequelize: Sequelize): Promise<void> {
	await sequelize.transaction(async (transaction) => {
		for (const place of DEMO_PLACES) {
			await Place.findOrCreate({
				where: { code: place.code },
				defaults: { ...place },
				transaction
			});
		}
		for (const party of DEMO_PARTIES) {
			const orgName = DEMO_ORGANIZATIONS.find((o) => o.key === party.organization)!.name;
			const organization = await Organization.findOne({
				where: where(fn('lower', col('name')), orgName.toLowerCase()),
				transaction,
				rejectOnEmpty: true
			});
			await Party.findOrCreate({
				where: { name: party.name },
				defaults: {
					organizationId: organization.id,
					name: party.name,
					line1: party.line1,
					line2: null,
					city: party.city,
					postalCode: party.postalCode ?? null,
					region: party.region ?? null,
					countryCode: party.countryCode,
					contactName: party.contactName ?? null,
					email: null,
					phone: null,
					taxIds: party.taxIds
				},
				transaction
			});
		}
		for (const demo of DEMO_PRODUCTS) {
			const existing = await Product.findOne({
				where: where(fn('lower', col('sku')), demo.sku.toLowerCase()),
				transaction
			});
			if (existing) continue;
			const b = demo.battery;
			const product = await Product.create(
				{
					sku: demo.sku,
					description: demo.description,
					hsCode: demo.hsCode,
					originCountry: demo.originCountry,
					unitPrice: demo.unitPrice,
					currency: demo.currency,
					netKgPerUnit: demo.netKgPerUnit,
					batteryConfig: b?.config ?? 'none',
					batteryChemistry: b?.chemistry ?? null,
					cellWh: b?.cellWh ?? null,
					batteryWh: b?.batteryWh ?? null,
					cellLithiumG: null,
					batteryLithiumG: null,
					nominalVoltage: b?.nominalVoltage ?? null,
					capacityAh: b?.capacityAh ?? null,
					cellsPerBattery: b?.cellsPerBattery ?? null,
					batteriesPerUnit: b?.batteriesPerUnit ?? null
				},
				{ transaction }
			);
			if (demo.packaging) {
				await ProductPackaging.create(
					{ productId: product.id, ...demo.packaging },
					{ transaction }
				);
			}
		}
	});
}
