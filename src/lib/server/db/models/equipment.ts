import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

// NUMERIC columns come back as strings: feed them to decimal.js, never to parseFloat.
export class PalletTypeRow extends Model<
	InferAttributes<PalletTypeRow>,
	InferCreationAttributes<PalletTypeRow>
> {
	declare id: CreationOptional<string>;
	declare code: string;
	declare name: string;
	declare lengthMm: number;
	declare widthMm: number;
	declare deckHeightMm: number;
	declare tareKg: string;
	declare maxGrossKg: string;
	declare maxLoadedHeightMm: number;
	declare sourceNote: string;
	declare version: CreationOptional<number>;
	/** true: added in Landfall, not from data/*.json. */
	declare custom: CreationOptional<boolean>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

export class ContainerTypeRow extends Model<
	InferAttributes<ContainerTypeRow>,
	InferCreationAttributes<ContainerTypeRow>
> {
	declare id: CreationOptional<string>;
	declare code: string;
	declare name: string;
	declare iso668Designation: string;
	declare iso6346SizeType: string;
	declare internalLengthMm: number;
	declare internalWidthMm: number;
	declare internalHeightMm: number;
	declare doorWidthMm: number;
	declare doorHeightMm: number;
	declare tareKg: string;
	declare maxGrossKg: string;
	declare maxPayloadKg: string;
	declare sourceNote: string;
	declare version: CreationOptional<number>;
	/** true: added in Landfall, not from data/*.json. */
	declare custom: CreationOptional<boolean>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

const int = () => ({ type: DataTypes.INTEGER, allowNull: false });
const kg = () => ({ type: DataTypes.DECIMAL(10, 3), allowNull: false });
const text = () => ({ type: DataTypes.TEXT, allowNull: false });
const id = () => ({ type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 });

export function initEquipmentModels(sequelize: Sequelize): void {
	PalletTypeRow.init(
		{
			id: id(),
			code: text(),
			name: text(),
			lengthMm: int(),
			widthMm: int(),
			deckHeightMm: int(),
			tareKg: kg(),
			maxGrossKg: kg(),
			maxLoadedHeightMm: int(),
			sourceNote: text(),
			version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
			custom: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
			createdAt: DataTypes.DATE,
			updatedAt: DataTypes.DATE
		},
		{ sequelize, tableName: 'pallet_types' }
	);
	ContainerTypeRow.init(
		{
			id: id(),
			code: text(),
			name: text(),
			iso668Designation: { ...text(), field: 'iso668_designation' },
			iso6346SizeType: { type: DataTypes.CHAR(4), allowNull: false, field: 'iso6346_size_type' },
			internalLengthMm: int(),
			internalWidthMm: int(),
			internalHeightMm: int(),
			doorWidthMm: int(),
			doorHeightMm: int(),
			tareKg: kg(),
			maxGrossKg: kg(),
			maxPayloadKg: kg(),
			sourceNote: text(),
			version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
			custom: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
			createdAt: DataTypes.DATE,
			updatedAt: DataTypes.DATE
		},
		{ sequelize, tableName: 'container_types' }
	);
}
