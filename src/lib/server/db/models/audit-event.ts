import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

export type AuditJson = Record<string, unknown> | null;

export class AuditEvent extends Model<
	InferAttributes<AuditEvent>,
	InferCreationAttributes<AuditEvent>
> {
	declare id: CreationOptional<string>;
	declare actorUserId: string | null;
	declare action: string;
	declare entity: string;
	declare entityId: string | null;
	declare before: AuditJson;
	declare after: AuditJson;
	declare ip: string | null;
	declare occurredAt: CreationOptional<Date>;
}

export class SignInAttempt extends Model<
	InferAttributes<SignInAttempt>,
	InferCreationAttributes<SignInAttempt>
> {
	declare id: CreationOptional<string>;
	declare email: string;
	declare ip: string | null;
	declare succeeded: boolean;
	declare attemptedAt: CreationOptional<Date>;
}

export function initAuditModels(sequelize: Sequelize): void {
	AuditEvent.init(
		{
			id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
			actorUserId: { type: DataTypes.UUID, allowNull: true },
			action: { type: DataTypes.TEXT, allowNull: false },
			entity: { type: DataTypes.TEXT, allowNull: false },
			entityId: { type: DataTypes.TEXT, allowNull: true },
			before: { type: DataTypes.JSONB, allowNull: true },
			after: { type: DataTypes.JSONB, allowNull: true },
			ip: { type: DataTypes.TEXT, allowNull: true },
			occurredAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW }
		},
		{ sequelize, tableName: 'audit_events', timestamps: false }
	);
	SignInAttempt.init(
		{
			id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
			email: { type: DataTypes.TEXT, allowNull: false },
			ip: { type: DataTypes.TEXT, allowNull: true },
			succeeded: { type: DataTypes.BOOLEAN, allowNull: false },
			attemptedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW }
		},
		{ sequelize, tableName: 'sign_in_attempts', timestamps: false }
	);
}
