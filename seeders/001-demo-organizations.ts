import { col, fn, where, type Sequelize } from 'sequelize';
import { Organization, OrganizationAddress, OrganizationTaxId } from '../src/lib/server/db/models';
import { DEMO_ORGANIZATIONS } from './demo-scenario';

// Idempotent: an organization is matched by name; its addresses and identifiers are added once.
export async function seed(sequelize: Sequelize): Promise<void> {
	await sequelize.transaction(async (transaction) => {
		for (const demo of DEMO_ORGANIZATIONS) {
			let organization = await Organization.findOne({
				where: where(fn('lower', col('name')), demo.name.toLowerCase()),
				transaction
			});
			organization ??= await Organization.create(
				{ name: demo.name, kind: demo.kind, countryCode: demo.countryCode },
				{ transaction }
			);
			const organizationId = organization.id;
			if ((await OrganizationAddress.count({ where: { organizationId }, transaction })) === 0) {
				await OrganizationAddress.bulkCreate(
					demo.addresses.map((a) => ({
						organizationId,
						purpose: a.purpose,
						label: a.label ?? null,
						line1: a.line1,
						line2: a.line2 ?? null,
						city: a.city,
						postalCode: a.postalCode ?? null,
						region: a.region ?? null,
						countryCode: a.countryCode
					})),
					{ transaction }
				);
			}
			for (const taxId of demo.taxIds) {
				await OrganizationTaxId.findOrCreate({
					where: { organizationId, type: taxId.type, value: taxId.value },
					defaults: {
						organizationId,
						type: taxId.type,
						value: taxId.value,
						countryCode: taxId.countryCode ?? null
					},
					transaction
				});
			}
		}
	});
}
