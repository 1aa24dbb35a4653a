import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

export class Place extends Model<InferAttributes<Place>, InferCreationAttributes<Place>> {
	declare id: CreationOptional<string>;
	/** UN/LOCODE-style: country + 3 characters, e.g. MYPEN. */
	declare code: string;
	declare name: string;
	declare kind: 'seaport' | 'airport' | 'inland' | 'rail_terminal' | 'road_terminal';
	declare countryCode: string;
	declare version: CreationOptional<number>;
	/** false: retired, kept for the shipments that name it, not offered for new ones. */
	declare active: CreationOptional<boolean>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

export interface PartyTaxId {
	type: string;
	value: string;
}

export class Party extends Model<InferAttributes<Party>, InferCreationAttributes<Party>> {
	declare id: CreationOptional<string>;
	declare organizationId: string | null;
	declare name: string;
	declare line1: string;
	declare line2: string | null;
	declare city: string;
	declare postalCode: string | null;
	declare region: string | null;
	declare countryCode: string;
	declare contactName: string | null;
	declare email: string | null;
	declare phone: string | null;
	declare taxIds: CreationOptional<PartyTaxId[]>;
	declare version: CreationOptional<number>;
	declare active: CreationOptional<boolean>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

const id = () => ({ type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 });
const versionAndActive = () => ({
	version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
	active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true }
});

export function initPlaceModels(sequelize: Sequelize): void {
	Place.init(
		{
			id: id(),
			code: { type: DataTypes.CHAR(5), allowNull: false },
			name: { type: DataTypes.TEXT, allowNull: false },
			kind: { type: DataTypes.TEXT, allowNull: false },
			countryCode: { type: DataTypes.CHAR(2), allowNull: false },
			...versionAndActive(),
			createdAt: DataTypes.DATE,
			updatedAt: DataTypes.DATE
		},
		{ sequelize, tableName: 'places' }
	);
	Party.init(
		{
			id: id(),
			organizationId: { type: DataTypes.UUID, allowNull: true },
			name: { type: DataTypes.TEXT, allowNull: false },
			line1: { type: DataTypes.TEXT, allowNull: false },
			line2: DataTypes.TEXT,
			city: { type: DataTypes.TEXT, allowNull: false },
			postalCode: DataTypes.TEXT,
			region: DataTypes.TEXT,
			countryCode: { type: DataTypes.CHAR(2), allowNull: false },
			contactName: DataTypes.TEXT,
			email: DataTypes.TEXT,
			phone: DataTypes.TEXT,
			taxIds: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
			...versionAndActive(),
			createdAt: DataTypes.DATE,
			updatedAt: DataTypes.DATE
		},
		{ sequelize, tableName: 'parties' }
	);
}
