import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

export type ShipmentStatus =
	| 'draft'
	| 'booked'
	| 'documents_issued'
	| 'in_transit'
	| 'arrived'
	| 'cleared'
	| 'delivered'
	| 'cancelled';
export type TransportMode = 'air' | 'sea_fcl' | 'sea_lcl' | 'road' | 'courier';

export class Shipment extends Model<InferAttributes<Shipment>, InferCreationAttributes<Shipment>> {
	declare id: CreationOptional<string>;
	declare reference: string;
	declare exporterId: string;
	declare customerId: string;
	declare brokerId: string | null;
	declare consigneeId: string | null;
	declare notifyPartyId: string | null;
	declare incoterm: string;
	declare incotermPlace: string;
	declare originId: string;
	declare destinationId: string;
	declare modesConsidered: TransportMode[];
	declare chosenMode: TransportMode | null;
	declare currency: string;
	declare status: CreationOptional<ShipmentStatus>;
	declare palletTypeId: string | null;
	declare carrier: string | null;
	declare vessel: string | null;
	declare voyageOrFlight: string | null;
	declare bookingNumber: string | null;
	/** DATEONLY: 'YYYY-MM-DD'. */
	declare etd: string | null;
	declare eta: string | null;
	declare notes: string | null;
	// What only the customs papers print (migration 011); null until the coordinator sets it.
	declare paymentTerms: CreationOptional<string | null>;
	declare exportReason: CreationOptional<string | null>;
	declare freightAmount: CreationOptional<string | null>;
	declare insuranceAmount: CreationOptional<string | null>;
	declare marks: CreationOptional<string | null>;
	declare signatoryName: CreationOptional<string | null>;
	declare signatoryTitle: CreationOptional<string | null>;
	declare signingPlace: CreationOptional<string | null>;
	// A claim of preferential origin and the statement the invoice carries (migration 019).
	declare preferentialOriginClaimed: CreationOptional<boolean>;
	declare preferentialAgreement: CreationOptional<string | null>;
	declare originStatement: CreationOptional<string | null>;
	declare version: CreationOptional<number>;
	declare createdBy: string | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

export class ShipmentLine extends Model<
	InferAttributes<ShipmentLine>,
	InferCreationAttributes<ShipmentLine>
> {
	declare id: CreationOptional<string>;
	declare shipmentId: string;
	declare position: number;
	declare productId: string;
	declare quantity: number;
	declare unitPrice: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

export class ShipmentStatusEvent extends Model<
	InferAttributes<ShipmentStatusEvent>,
	InferCreationAttributes<ShipmentStatusEvent>
> {
	declare id: CreationOptional<string>;
	declare shipmentId: string;
	declare fromStatus: ShipmentStatus | null;
	declare toStatus: ShipmentStatus;
	declare actorUserId: string | null;
	declare note: string | null;
	declare occurredAt: CreationOptional<Date>;
}

export class ShipmentContainer extends Model<
	InferAttributes<ShipmentContainer>,
	InferCreationAttributes<ShipmentContainer>
> {
	declare id: CreationOptional<string>;
	declare shipmentId: string;
	declare containerTypeId: string | null;
	declare containerNumber: string;
	declare sealNumber: string | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

const id = () => ({ type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 });
const uuid = (allowNull: boolean) => ({ type: DataTypes.UUID, allowNull });
const optionalText = () => ({ type: DataTypes.TEXT, allowNull: true });
const timestamps = () => ({ createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE });

export function initShipmentModels(sequelize: Sequelize): void {
	Shipment.init(
		{
			id: id(),
			reference: { type: DataTypes.TEXT, allowNull: false },
			exporterId: uuid(false),
			customerId: uuid(false),
			brokerId: uuid(true),
			consigneeId: uuid(true),
			notifyPartyId: uuid(true),
			incoterm: { type: DataTypes.CHAR(3), allowNull: false },
			incotermPlace: { type: DataTypes.TEXT, allowNull: false },
			originId: uuid(false),
			destinationId: uuid(false),
			modesConsidered: {
				type: DataTypes.ARRAY(DataTypes.TEXT),
				allowNull: false,
				defaultValue: []
			},
			chosenMode: optionalText(),
			currency: { type: DataTypes.CHAR(3), allowNull: false },
			status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'draft' },
			palletTypeId: uuid(true),
			carrier: optionalText(),
			vessel: optionalText(),
			voyageOrFlight: optionalText(),
			bookingNumber: optionalText(),
			etd: { type: DataTypes.DATEONLY, allowNull: true },
			eta: { type: DataTypes.DATEONLY, allowNull: true },
			notes: optionalText(),
			paymentTerms: optionalText(),
			exportReason: optionalText(),
			freightAmount: { type: DataTypes.DECIMAL(14, 4), allowNull: true },
			insuranceAmount: { type: DataTypes.DECIMAL(14, 4), allowNull: true },
			marks: optionalText(),
			signatoryName: optionalText(),
			signatoryTitle: optionalText(),
			signingPlace: optionalText(),
			preferentialOriginClaimed: {
				type: DataTypes.BOOLEAN,
				allowNull: false,
				defaultValue: false
			},
			preferentialAgreement: optionalText(),
			originStatement: optionalText(),
			version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
			createdBy: uuid(true),
			...timestamps()
		},
		{ sequelize, tableName: 'shipments', version: true }
	);
	ShipmentLine.init(
		{
			id: id(),
			shipmentId: uuid(false),
			position: { type: DataTypes.INTEGER, allowNull: false },
			productId: uuid(false),
			quantity: { type: DataTypes.INTEGER, allowNull: false },
			unitPrice: { type: DataTypes.DECIMAL(14, 4), allowNull: false },
			...timestamps()
		},
		{ sequelize, tableName: 'shipment_lines' }
	);
	ShipmentStatusEvent.init(
		{
			id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
			shipmentId: uuid(false),
			fromStatus: optionalText(),
			toStatus: { type: DataTypes.TEXT, allowNull: false },
			actorUserId: uuid(true),
			note: optionalText(),
			occurredAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW }
		},
		{ sequelize, tableName: 'shipment_status_events', timestamps: false }
	);
	ShipmentContainer.init(
		{
			id: id(),
			shipmentId: uuid(false),
			containerTypeId: uuid(true),
			containerNumber: { type: DataTypes.CHAR(11), allowNull: false },
			sealNumber: optionalText(),
			...timestamps()
		},
		{ sequelize, tableName: 'shipment_containers' }
	);
}
