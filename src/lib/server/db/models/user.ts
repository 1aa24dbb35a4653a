import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { Role } from '../../../roles';
import type { Organization } from './organization';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
	declare id: CreationOptional<string>;
	declare organizationId: ForeignKey<Organization['id']>;
	declare role: Role;
	declare email: string;
	declare name: string;
	declare passwordHash: string;
	declare disabled: CreationOptional<boolean>;
	declare lastSignInAt: Date | null;
	/** Optimistic lock: Sequelize checks and bumps it on every save. */
	declare version: CreationOptional<number>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

export function initUserModel(sequelize: Sequelize): void {
	User.init(
		{
			id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
			role: { type: DataTypes.TEXT, allowNull: false },
			email: { type: DataTypes.TEXT, allowNull: false },
			name: { type: DataTypes.TEXT, allowNull: false },
			passwordHash: { type: DataTypes.TEXT, allowNull: false },
			disabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
			lastSignInAt: { type: DataTypes.DATE, allowNull: true },
			version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
			createdAt: DataTypes.DATE,
			updatedAt: DataTypes.DATE
		},
		{
			sequelize,
			tableName: 'users',
			version: true,
			defaultScope: { attributes: { exclude: ['passwordHash'] } },
			scopes: { withPassword: { attributes: { include: ['passwordHash'] } } }
		}
	);
}
