import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

import type { BATTERY_CHEMISTRY_VALUES, BATTERY_CONFIG_VALUES } from '../../../products';

export type BatteryConfig = (typeof BATTERY_CONFIG_VALUES)[number];
export type BatteryChemistry = (typeof BATTERY_CHEMISTRY_VALUES)[number];

// Decimal columns are strings (exact); integers are numbers.
export class Product extends Model<InferAttributes<Product>, InferCreationAttributes<Product>> {
	declare id: CreationOptional<string>;
	declare sku: string;
	declare description: string;
	declare hsCode: string;
	declare originCountry: string;
	declare unitPrice: string;
	declare currency: string;
	declare netKgPerUnit: string;
	declare batteryConfig: CreationOptional<BatteryConfig>;
	declare batteryChemistry: BatteryChemistry | null;
	declare cellWh: string | null;
	declare batteryWh: string | null;
	declare cellLithiumG: string | null;
	declare batteryLithiumG: string | null;
	declare nominalVoltage: string | null;
	declare capacityAh: string | null;
	declare cellsPerBattery: number | null;
	declare batteriesPerUnit: number | null;
	/** Optimistic lock, bumped in SQL by the products service on every save. */
	declare version: CreationOptional<number>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

export class ProductPackaging extends Model<
	InferAttributes<ProductPackaging>,
	InferCreationAttributes<ProductPackaging>
> {
	declare id: CreationOptional<string>;
	declare productId: ForeignKey<Product['id']>;
	declare unitsPerCarton: number;
	declare cartonLengthMm: number;
	declare cartonWidthMm: number;
	declare cartonHeightMm: number;
	declare cartonGrossKg: string;
	declare orientation: 'any' | 'this_way_up';
	/** null: not stackable. */
	declare maxLoadOnTopKg: string | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

const optionalDecimal = (p: number, s: number) => ({
	type: DataTypes.DECIMAL(p, s),
	allowNull: true
});

export function initProductModels(sequelize: Sequelize): void {
	Product.init(
		{
			id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
			sku: { type: DataTypes.TEXT, allowNull: false },
			description: { type: DataTypes.TEXT, allowNull: false },
			hsCode: { type: DataTypes.STRING(10), allowNull: false },
			originCountry: { type: DataTypes.CHAR(2), allowNull: false },
			unitPrice: { type: DataTypes.DECIMAL(14, 4), allowNull: false },
			currency: { type: DataTypes.CHAR(3), allowNull: false },
			netKgPerUnit: { type: DataTypes.DECIMAL(12, 4), allowNull: false },
			batteryConfig: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'none' },
			batteryChemistry: { type: DataTypes.TEXT, allowNull: true },
			cellWh: optionalDecimal(10, 2),
			batteryWh: optionalDecimal(10, 2),
			cellLithiumG: optionalDecimal(10, 3),
			batteryLithiumG: optionalDecimal(10, 3),
			nominalVoltage: optionalDecimal(8, 3),
			capacityAh: optionalDecimal(10, 4),
			cellsPerBattery: { type: DataTypes.INTEGER, allowNull: true },
			batteriesPerUnit: { type: DataTypes.INTEGER, allowNull: true },
			version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
			createdAt: DataTypes.DATE,
			updatedAt: DataTypes.DATE
		},
		{ sequelize, tableName: 'products' }
	);
	ProductPackaging.init(
		{
			id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
			unitsPerCarton: { type: DataTypes.INTEGER, allowNull: false },
			cartonLengthMm: { type: DataTypes.INTEGER, allowNull: false },
			cartonWidthMm: { type: DataTypes.INTEGER, allowNull: false },
			cartonHeightMm: { type: DataTypes.INTEGER, allowNull: false },
			cartonGrossKg: { type: DataTypes.DECIMAL(10, 3), allowNull: false },
			orientation: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'any' },
			maxLoadOnTopKg: optionalDecimal(10, 3),
			createdAt: DataTypes.DATE,
			updatedAt: DataTypes.DATE
		},
		{ sequelize, tableName: 'product_packagings' }
	);
}
