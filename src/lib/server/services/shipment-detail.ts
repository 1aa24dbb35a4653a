import { Op } from 'sequelize';
import type { SessionUser } from '../auth/session-user';
import {
	ContainerTypeRow,
	Organization,
	Party,
	Place,
	Product,
	ProductPackaging,
	Shipment,
	ShipmentContainer,
	ShipmentLine,
	ShipmentStatusEvent,
	User
} from '../db/models';
import { shipmentScopeWhere } from './shipment-scope';

/** Everything the shipment page and GET /api/v1/shipments/{id} show, as plain data. */
export async function getShipment(user: SessionUser, id: string) {
	const shipment = await Shipment.findOne({
		where: { [Op.and]: [{ id }, shipmentScopeWhere(user)] }
	});
	if (!shipment) return null;
	const [customer, broker, consignee, notifyParty, origin, destination, lines, containers, events] =
		await Promise.all([
			Organization.findByPk(shipment.customerId, { attributes: ['id', 'name', 'countryCode'] }),
			shipment.brokerId
				? Organization.findByPk(shipment.brokerId, { attributes: ['id', 'name'] })
				: null,
			shipment.consigneeId ? Party.findByPk(shipment.consigneeId) : null,
			shipment.notifyPartyId ? Party.findByPk(shipment.notifyPartyId) : null,
			Place.findByPk(shipment.originId),
			Place.findByPk(shipment.destinationId),
			ShipmentLine.findAll({
				where: { shipmentId: id },
				order: [['position', 'ASC']],
				include: [
					{
						model: Product,
						as: 'product',
						include: [{ model: ProductPackaging, as: 'packaging' }]
					}
				]
			}),
			ShipmentContainer.findAll({ where: { shipmentId: id }, order: [['createdAt', 'ASC']] }),
			ShipmentStatusEvent.findAll({
				where: { shipmentId: id },
				order: [
					['occurredAt', 'ASC'],
					['id', 'ASC']
				]
			})
		]);
	const containerTypes = new Map(
		(await ContainerTypeRow.findAll({ attributes: ['id', 'code', 'name'] })).map((c) => [c.id, c])
	);
	const actors = new Map(
		(
			await User.findAll({
				where: { id: events.map((e) => e.actorUserId).filter((x): x is string => !!x) },
				attributes: ['id', 'name']
			})
		).map((u) => [u.id, u.name])
	);
	const plain = shipment.get({ plain: true });
	const partyView = (p: Party | null) =>
		p ? { id: p.id, name: p.name, city: p.city, countryCode: p.countryCode } : null;
	const placeView = (p: Place | null) =>
		p ? { id: p.id, code: p.code, name: p.name, kind: p.kind, countryCode: p.countryCode } : null;
	return {
		...plain,
		createdAt: plain.createdAt.toISOString(),
		updatedAt: plain.updatedAt.toISOString(),
		customer: customer
			? { id: customer.id, name: customer.name, countryCode: customer.countryCode }
			: null,
		broker: broker ? { id: broker.id, name: broker.name } : null,
		consignee: partyView(consignee),
		notifyParty: partyView(notifyParty),
		origin: placeView(origin),
		destination: placeView(destination),
		lines: lines.map((line) => {
			const product = (
				line as ShipmentLine & { product: Product & { packaging: ProductPackaging | null } }
			).product;
			return {
				id: line.id,
				position: line.position,
				productId: line.productId,
				sku: product.sku,
				description: product.description,
				hsCode: product.hsCode,
				quantity: line.quantity,
				unitPrice: line.unitPrice,
				hasPackaging: product.packaging !== null
			};
		}),
		containers: containers.map((c) => ({
			id: c.id,
			containerNumber: c.containerNumber,
			sealNumber: c.sealNumber,
			containerType: c.containerTypeId
				? (containerTypes.get(c.containerTypeId)?.name ?? null)
				: null
		})),
		statusEvents: events.map((e) => ({
			id: String(e.id),
			fromStatus: e.fromStatus,
			toStatus: e.toStatus,
			actorName: e.actorUserId ? (actors.get(e.actorUserId) ?? null) : null,
			note: e.note,
			occurredAt: e.occurredAt.toISOString()
		}))
	};
}
export type ShipmentDetail = NonNullable<Awaited<ReturnType<typeof getShipment>>>;
