import { expect, type APIRequestContext } from '@playwright/test';

// Records the fuzz specs make for themselves, so a case that happens to pass changes none of the
// seeded data other tests rely on: a draft shipment like Hallvik's seeded one.

const HEADER_FIELDS = [
	'customerId',
	'consigneeId',
	'notifyPartyId',
	'brokerId',
	'incoterm',
	'incotermPlace',
	'originId',
	'destinationId',
	'modesConsidered',
	'chosenMode',
	'currency',
	'palletTypeId',
	'carrier',
	'vessel',
	'voyageOrFlight',
	'bookingNumber',
	'etd',
	'eta',
	'notes'
];

export interface ShipmentJson extends Record<string, unknown> {
	id: string;
	reference: string;
	version: number;
	lines: { productId: string; quantity: number; unitPrice: string }[];
}

/** The header fields of a shipment as the API's POST and PATCH take them. */
export const headerOf = (s: ShipmentJson): Record<string, unknown> =>
	Object.fromEntries(HEADER_FIELDS.map((k) => [k, s[k] ?? '']));

export const linesOf = (s: ShipmentJson) =>
	s.lines.map(({ productId, quantity, unitPrice }) => ({ productId, quantity, unitPrice }));

export async function shipmentJson(client: APIRequestContext, id: string): Promise<ShipmentJson> {
	return (await (await client.get(`/api/v1/shipments/${id}`)).json()) as ShipmentJson;
}

/** A new draft with the template's parties, broker and lines (and `changes` to its header). */
export async function freshShipment(
	client: APIRequestContext,
	template: ShipmentJson,
	changes: Record<string, unknown> = {}
): Promise<ShipmentJson> {
	const created = await client.post('/api/v1/shipments', {
		data: { ...headerOf(template), ...changes }
	});
	expect(created.status(), await created.text()).toBe(201);
	const { id } = (await created.json()) as { id: string };
	const lines = { lines: linesOf(template), version: 0 };
	const put = await client.put(`/api/v1/shipments/${id}/lines`, { data: lines });
	expect(put.status(), await put.text()).toBe(200);
	return shipmentJson(client, id);
}

/** A small valid body of POST /api/v1/calc/measure, so mutations reach the packing checks. */
export const MEASURE_BASE = {
	products: [
		{
			sku: 'FUZZ-1',
			netKgPerUnit: '0.5',
			packaging: {
				unitsPerCarton: 10,
				lengthMm: 400,
				widthMm: 300,
				heightMm: 250,
				cartonGrossKg: '6.2',
				orientation: 'this_way_up',
				maxLoadOnTopKg: '40'
			}
		}
	],
	lines: [{ sku: 'FUZZ-1', quantity: 25 }]
};
