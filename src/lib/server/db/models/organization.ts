import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { OrganizationKind } from '../../../roles';

export class Organization extends Model<
	InferAttributes<Organization>,
	InferCreationAttributes<Organization>
> {
	declare id: CreationOptional<string>;
	declare name: string;
	declare kind: OrganizationKind;
	declare countryCode: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

export const ADDRESS_PURPOSES = ['registered', 'billing', 'delivery', 'factory', 'office'] as const;
export type AddressPurpose = (typeof ADDRESS_PURPOSES)[number];

export class OrganizationAddress extends Model<
	InferAttributes<OrganizationAddress>,
	InferCreationAttributes<OrganizationAddress>
> {
	declare id: CreationOptional<string>;
	declare organizationId: ForeignKey<Organization['id']>;
	declare purpose: AddressPurpose;
	declare label: string | null;
	declare line1: string;
	declare line2: string | null;
	declare city: string;
	declare postalCode: string | null;
	declare region: string | null;
	declare countryCode: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

export class OrganizationTaxId extends Model<
	InferAttributes<OrganizationTaxId>,
	InferCreationAttributes<OrganizationTaxId>
> {
	declare id: CreationOptional<string>;
	declare organizationId: ForeignKey<Organization['id']>;
	declare type: string;
	declare value: string;
	declare countryCode: string | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

const id = () => ({ type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 });
const timestamps = () => ({ createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE });

export function initOrganizationModels(sequelize: Sequelize): void {
	Organization.init(
		{
			id: id(),
			name: { type: DataTypes.TEXT, allowNull: false },
			kind: { type: DataTypes.TEXT, allowNull: false },
			countryCode: { type: DataTypes.CHAR(2), allowNull: false },
			...timestamps()
		},
		{ sequelize, tableName: 'organizations' }
	);
	OrganizationAddress.init(
		{
			id: id(),
			purpose: { type: DataTypes.TEXT, allowNull: false },
			label: DataTypes.TEXT,
			line1: { type: DataTypes.TEXT, allowNull: false },
			line2: DataTypes.TEXT,
			city: { type: DataTypes.TEXT, allowNull: false },
			postalCode: DataTypes.TEXT,
			region: DataTypes.TEXT,
			countryCode: { type: DataTypes.CHAR(2), allowNull: false },
			...timestamps()
		},
		{ sequelize, tableName: 'organization_addresses' }
	);
	OrganizationTaxId.init(
		{
			id: id(),
			type: { type: DataTypes.TEXT, allowNull: false },
			value: { type: DataTypes.TEXT, allowNull: false },
			countryCode: DataTypes.CHAR(2),
			...timestamps()
		},
		{ sequelize, tableName: 'organization_tax_ids' }
	);
}
