import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

export class ApiToken extends Model<InferAttributes<ApiToken>, InferCreationAttributes<ApiToken>> {
	declare id: CreationOptional<string>;
	declare userId: string;
	declare name: string;
	/** SHA-256 of the token, hex; the token itself is never stored. */
	declare tokenHash: string;
	declare prefix: string;
	declare createdBy: string | null;
	declare createdAt: CreationOptional<Date>;
	declare lastUsedAt: Date | null;
	declare revokedAt: Date | null;
}

export function initApiTokenModel(sequelize: Sequelize): void {
	ApiToken.init(
		{
			id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
			userId: { type: DataTypes.UUID, allowNull: false },
			name: { type: DataTypes.TEXT, allowNull: false },
			tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
			prefix: { type: DataTypes.TEXT, allowNull: false },
			createdBy: { type: DataTypes.UUID, allowNull: true },
			createdAt: DataTypes.DATE,
			lastUsedAt: { type: DataTypes.DATE, allowNull: true },
			revokedAt: { type: DataTypes.DATE, allowNull: true }
		},
		{ sequelize, tableName: 'api_tokens', updatedAt: false }
	);
}
