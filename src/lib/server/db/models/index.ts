import type { Sequelize } from 'sequelize';
import { initAuditModels } from './audit-event';
import {
	Organization,
	OrganizationAddress,
	OrganizationTaxId,
	initOrganizationModels
} from './organization';
import { User, initUserModel } from './user';

export * from './audit-event';
export * from './organization';
export * from './user';

let initialised: Sequelize | undefined;

export function initModels(sequelize: Sequelize): void {
	// Models are module-level classes; bind them to one connection only.
	if (initialised === sequelize) return;
	if (initialised) throw new Error('The models are already bound to another connection');
	initialised = sequelize;
	initOrganizationModels(sequelize);
	initUserModel(sequelize);
	initAuditModels(sequelize);

	Organization.hasMany(OrganizationAddress, { foreignKey: 'organizationId', as: 'addresses' });
	OrganizationAddress.belongsTo(Organization, { foreignKey: 'organizationId' });
	Organization.hasMany(OrganizationTaxId, { foreignKey: 'organizationId', as: 'taxIds' });
	OrganizationTaxId.belongsTo(Organization, { foreignKey: 'organizationId' });
	Organization.hasMany(User, { foreignKey: 'organizationId', as: 'users' });
	User.belongsTo(Organization, { foreignKey: 'organizationId', as: 'organization' });
}
