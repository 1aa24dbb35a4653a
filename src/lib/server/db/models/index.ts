import type { Sequelize } from 'sequelize';
import { initApiTokenModel } from './api-token';
import { initAuditModels } from './audit-event';
import {
	Organization,
	OrganizationAddress,
	OrganizationTaxId,
	initOrganizationModels
} from './organization';
import { initEquipmentModels } from './equipment';
import { Place, Party, initPlaceModels } from './place';
import { Product, ProductPackaging, initProductModels } from './product';
import {
	Shipment,
	ShipmentContainer,
	ShipmentLine,
	ShipmentStatusEvent,
	initShipmentModels
} from './shipment';
import { initShipmentLoadPlanModel } from './shipment-load-plan';
import { User, initUserModel } from './user';

export * from './api-token';
export * from './audit-event';
export * from './equipment';
export * from './organization';
export * from './place';
export * from './product';
export * from './shipment';
export * from './shipment-load-plan';
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
	initApiTokenModel(sequelize);
	initEquipmentModels(sequelize);
	initPlaceModels(sequelize);
	initProductModels(sequelize);
	initShipmentModels(sequelize);
	initShipmentLoadPlanModel(sequelize);

	Organization.hasMany(OrganizationAddress, { foreignKey: 'organizationId', as: 'addresses' });
	OrganizationAddress.belongsTo(Organization, { foreignKey: 'organizationId' });
	Organization.hasMany(OrganizationTaxId, { foreignKey: 'organizationId', as: 'taxIds' });
	OrganizationTaxId.belongsTo(Organization, { foreignKey: 'organizationId' });
	Organization.hasMany(User, { foreignKey: 'organizationId', as: 'users' });
	User.belongsTo(Organization, { foreignKey: 'organizationId', as: 'organization' });
	Party.belongsTo(Organization, { foreignKey: 'organizationId', as: 'organization' });

	Product.hasOne(ProductPackaging, { foreignKey: 'productId', as: 'packaging' });
	ProductPackaging.belongsTo(Product, { foreignKey: 'productId' });

	Shipment.belongsTo(Organization, { foreignKey: 'customerId', as: 'customer' });
	Shipment.belongsTo(Organization, { foreignKey: 'exporterId', as: 'exporter' });
	Shipment.belongsTo(Organization, { foreignKey: 'brokerId', as: 'broker' });
	Shipment.belongsTo(Party, { foreignKey: 'consigneeId', as: 'consignee' });
	Shipment.belongsTo(Party, { foreignKey: 'notifyPartyId', as: 'notifyParty' });
	Shipment.belongsTo(Place, { foreignKey: 'originId', as: 'origin' });
	Shipment.belongsTo(Place, { foreignKey: 'destinationId', as: 'destination' });
	Shipment.hasMany(ShipmentLine, { foreignKey: 'shipmentId', as: 'lines' });
	ShipmentLine.belongsTo(Shipment, { foreignKey: 'shipmentId' });
	ShipmentLine.belongsTo(Product, { foreignKey: 'productId', as: 'product' });
	Shipment.hasMany(ShipmentStatusEvent, { foreignKey: 'shipmentId', as: 'statusEvents' });
	Shipment.hasMany(ShipmentContainer, { foreignKey: 'shipmentId', as: 'containers' });
}
