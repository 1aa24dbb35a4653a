import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

/** The cached load plan of one shipment revision (see migrations/…-010-shipment-load-plans). */
export class ShipmentLoadPlan extends Model<
	InferAttributes<ShipmentLoadPlan>,
	InferCreationAttributes<ShipmentLoadPlan>
> {
	declare shipmentId: string;
	declare shipmentVersion: number;
	declare inputHash: string;
	declare plan: unknown;
	declare createdAt: CreationOptional<Date>;
}

export function initShipmentLoadPlanModel(sequelize: Sequelize): void {
	ShipmentLoadPlan.init(
		{
			shipmentId: { type: DataTypes.UUID, primaryKey: true },
			shipmentVersion: { type: DataTypes.INTEGER, allowNull: false },
			inputHash: { type: DataTypes.CHAR(64), allowNull: false },
			plan: { type: DataTypes.JSONB, allowNull: false },
			createdAt: DataTypes.DATE
		},
		{ sequelize, tableName: 'shipment_load_plans', updatedAt: false }
	);
}
