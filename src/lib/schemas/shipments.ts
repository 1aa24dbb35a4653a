import { z } from 'zod';
import { INCOTERM_CODES } from '../trade/incoterms';
import { SHIPMENT_STATUSES, TRANSPORT_MODES } from '../trade/shipment-status';
import { validateContainerNumber } from '../trade/iso6346';
import { currencyCode, decimalString, positiveInt } from './fields';

const optionalId = z.union([z.literal(''), z.uuid()]).default('');
const shortText = (label: string, max = 60) =>
	z.string().trim().max(max, `${label}: at most ${max} characters.`).default('');
const isoDate = z
	.union([z.literal(''), z.iso.date({ error: 'Enter a date as YYYY-MM-DD.' })])
	.default('');

/** The shipment's header: parties, terms, route, modes and carrier details. */
export const shipmentSchema = z
	.object({
		customerId: z.uuid({ error: 'Choose the customer.' }),
		consigneeId: optionalId,
		notifyPartyId: optionalId,
		brokerId: optionalId,
		incoterm: z.enum(INCOTERM_CODES, { error: 'Choose an Incoterms® 2020 rule.' }),
		incotermPlace: z
			.string()
			.trim()
			.min(1, 'Name the place the Incoterms rule refers to, e.g. “Port Klang”.')
			.max(120),
		originId: z.uuid({ error: 'Choose where the goods leave from.' }),
		destinationId: z.uuid({ error: 'Choose where the goods go.' }),
		modesConsidered: z.array(z.enum(TRANSPORT_MODES)).min(1, 'Tick at least one mode to consider.'),
		chosenMode: z.union([z.literal(''), z.enum(TRANSPORT_MODES)]).default(''),
		currency: currencyCode,
		palletTypeId: optionalId,
		carrier: shortText('Carrier'),
		vessel: shortText('Vessel'),
		voyageOrFlight: shortText('Voyage or flight'),
		bookingNumber: shortText('Booking number'),
		etd: isoDate,
		eta: isoDate,
		notes: shortText('Notes', 2000),
		version: z.number().int().min(0).default(0)
	})
	.superRefine((s, ctx) => {
		if (s.originId && s.originId === s.destinationId) {
			ctx.addIssue({
				code: 'custom',
				path: ['destinationId'],
				message: 'Destination and origin are the same place.'
			});
		}
		if (s.chosenMode && !s.modesConsidered.includes(s.chosenMode)) {
			ctx.addIssue({
				code: 'custom',
				path: ['chosenMode'],
				message: 'The chosen mode must be one of those considered.'
			});
		}
		if (s.etd && s.eta && s.eta < s.etd) {
			ctx.addIssue({
				code: 'custom',
				path: ['eta'],
				message: 'Arrival cannot be before departure.'
			});
		}
	});
export type ShipmentInput = z.infer<typeof shipmentSchema>;

export const shipmentLineSchema = z.object({
	productId: z.uuid({ error: 'Choose a product.' }),
	quantity: positiveInt('Quantity', 10_000_000),
	/** Empty: the product's current price. */
	unitPrice: z.union([z.literal(''), decimalString('Unit price', 4, 'zero')]).default('')
});

export const shipmentLinesSchema = z.object({
	lines: z.array(shipmentLineSchema).max(2000, 'At most 2,000 lines per shipment.'),
	version: z.number().int().min(0)
});
export type ShipmentLinesInput = z.infer<typeof shipmentLinesSchema>;

export const statusChangeSchema = z.object({
	to: z.enum(SHIPMENT_STATUSES),
	note: shortText('Note', 500),
	version: z.number().int().min(0)
});

export const containerSchema = z.object({
	containerNumber: z
		.string()
		.trim()
		.transform((value, ctx) => {
			const result = validateContainerNumber(value);
			if (!result.ok) {
				ctx.addIssue({ code: 'custom', message: result.message });
				return z.NEVER;
			}
			return result.normalized;
		}),
	containerTypeId: optionalId,
	sealNumber: shortText('Seal number', 40),
	version: z.number().int().min(0)
});

/** Query of the shipments list (and GET /api/v1/shipments). */
export const SHIPMENT_SORTS = ['reference', 'etd', 'created', 'status', 'customer'] as const;
export const shipmentListQuerySchema = z.object({
	status: z.union([z.literal(''), z.enum(SHIPMENT_STATUSES)]).default(''),
	customerId: optionalId,
	mode: z.union([z.literal(''), z.enum(TRANSPORT_MODES)]).default(''),
	from: isoDate,
	to: isoDate,
	q: z.string().trim().max(60).default(''),
	sort: z.enum(SHIPMENT_SORTS).default('created'),
	dir: z.enum(['asc', 'desc']).default('desc'),
	page: z.coerce.number().int().min(1).max(100_000).default(1),
	pageSize: z.coerce.number().int().min(1).max(200).default(25)
});
export type ShipmentListQuery = z.infer<typeof shipmentListQuerySchema>;

/** One lot (and optionally a serial-number range) packed in a carton range of the shipment. */
const lotFields = {
	productId: z.uuid({ error: 'Choose the product.' }),
	cartonFrom: positiveInt('First carton', 1_000_000),
	cartonTo: positiveInt('Last carton', 1_000_000),
	lotNumber: z.string().trim().min(1, 'Enter the lot number.').max(40),
	serialFrom: shortText('First serial number', 40),
	serialTo: shortText('Last serial number', 40)
};

type LotFields = { cartonFrom: number; cartonTo: number; serialFrom: string; serialTo: string };

function checkLot(lot: LotFields, ctx: z.RefinementCtx) {
	if (lot.cartonTo < lot.cartonFrom) {
		ctx.addIssue({
			code: 'custom',
			path: ['cartonTo'],
			message: 'The last carton comes before the first.'
		});
	}
	if (Boolean(lot.serialFrom) !== Boolean(lot.serialTo)) {
		const path = lot.serialFrom ? 'serialTo' : 'serialFrom';
		ctx.addIssue({
			code: 'custom',
			path: [path],
			message: 'Give both ends of the serial range, or neither.'
		});
	} else if (lot.serialFrom && lot.serialTo) {
		if (lot.serialFrom.length !== lot.serialTo.length) {
			ctx.addIssue({
				code: 'custom',
				path: ['serialTo'],
				message: 'Both serial numbers need the same length, e.g. PB20-000001 to PB20-000500.'
			});
		} else if (lot.serialFrom > lot.serialTo) {
			ctx.addIssue({
				code: 'custom',
				path: ['serialTo'],
				message: 'The last serial number comes before the first.'
			});
		}
	}
}

/** One lot without the shipment's version: a row of a CSV import. */
export const lotRowSchema = z.object(lotFields).superRefine(checkLot);
export type LotRowInput = z.infer<typeof lotRowSchema>;

export const lotSchema = z
	.object({ ...lotFields, version: z.number().int().min(0) })
	.superRefine(checkLot);

/** Lots from a CSV file, added together or not at all. */
export const MAX_LOTS_PER_IMPORT = 500;
export const lotImportSchema = z.object({
	lots: z
		.array(lotRowSchema)
		.min(1, 'The file has no lots to add.')
		.max(MAX_LOTS_PER_IMPORT, `At most ${MAX_LOTS_PER_IMPORT} lots per file.`),
	version: z.number().int().min(0)
});
export type LotInput = z.infer<typeof lotSchema>;
