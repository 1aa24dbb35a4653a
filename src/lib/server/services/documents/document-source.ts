/**
 * Gathers what the papers are made from (src/lib/documents/source.ts) for a stored shipment,
 * scoped like the shipment itself. The cached load plan of this revision is included when there
 * is one; issuing never waits for the planner.
 */
import Decimal from 'decimal.js';
import type { DocumentSource, SourceParty } from '../../../documents/source';
import type { SessionUser } from '../../auth/session-user';
import {
	Organization,
	OrganizationAddress,
	OrganizationTaxId,
	Party,
	PalletTypeRow,
	Shipment
} from '../../db/models';
import { cachedLoadPlan } from '../load-plan';
import { listLots } from '../shipment-lots';
import { measureShipment } from '../shipment-measure';
import { productsBySku } from '../products';
import { currentDocumentsOfKind } from '../supporting-documents';
import type { ShipmentLoadPlanView } from '../../../load-plan-input';

/** Address purposes to print, best first: the buyer is billed, the exporter is registered. */
const BUYER_ADDRESS = ['billing', 'registered', 'office', 'delivery', 'factory'];
const EXPORTER_ADDRESS = ['registered', 'office', 'factory', 'billing', 'delivery'];

async function organizationParty(id: string, purposes: string[]): Promise<SourceParty | null> {
	const [org, addresses, taxIds] = await Promise.all([
		Organization.findByPk(id),
		OrganizationAddress.findAll({ where: { organizationId: id } }),
		OrganizationTaxId.findAll({ where: { organizationId: id }, order: [['type', 'ASC']] })
	]);
	if (!org) return null;
	const rank = (p: string) => (purposes.indexOf(p) + purposes.length + 1) % (purposes.length + 1);
	const address = [...addresses].sort((a, b) => rank(a.purpose) - rank(b.purpose))[0];
	return {
		name: org.name,
		line1: address?.line1 ?? null,
		line2: address?.line2 ?? null,
		postalCode: address?.postalCode ?? null,
		city: address?.city ?? null,
		region: address?.region ?? null,
		countryCode: address?.countryCode ?? org.countryCode,
		taxIds: taxIds.map((t) => ({ type: t.type, value: t.value })),
		contactName: null,
		email: null,
		phone: null
	};
}

function partyOf(p: Party | null): SourceParty | null {
	if (!p) return null;
	return {
		name: p.name,
		line1: p.line1,
		line2: p.line2,
		postalCode: p.postalCode,
		city: p.city,
		region: p.region,
		countryCode: p.countryCode,
		taxIds: (p.taxIds ?? []).map((t) => ({ type: t.type, value: t.value })),
		contactName: p.contactName,
		email: p.email,
		phone: p.phone
	};
}

function loadPlanFigures(view: ShipmentLoadPlanView | null): DocumentSource['loadPlan'] {
	if (!view) return null;
	const names = new Map(view.containerTypes.map((c) => [c.id, c.name]));
	return {
		containers: view.plan.containers.map((c) => ({
			label: `Container ${c.index}`,
			type: names.get(c.containerTypeId) ?? c.containerTypeId,
			pieces: c.pieces,
			volumeUsedPercent: new Decimal(c.volumeUtilisation).times(100).toFixed(1),
			payloadKg: c.payloadKg
		})),
		unplaced: view.plan.unplaced.reduce((n, u) => n + u.count, 0)
	};
}

export interface GatheredSource {
	source: DocumentSource;
	shipmentId: string;
	exporterId: string;
	version: number;
	/** The cached plan the packing list's pictures are drawn from, if any. */
	loadPlan: ShipmentLoadPlanView | null;
}

export async function documentSource(
	user: SessionUser,
	shipmentId: string
): Promise<GatheredSource | null> {
	const measured = await measureShipment(user, shipmentId);
	if (!measured) return null;
	const { shipment: s, result } = measured;
	const row = await Shipment.findByPk(shipmentId);
	if (!row) return null;
	const [exporter, buyer, consignee, notify, products, lots, pallet, plan] = await Promise.all([
		organizationParty(row.exporterId, EXPORTER_ADDRESS),
		organizationParty(row.customerId, BUYER_ADDRESS),
		row.consigneeId ? Party.findByPk(row.consigneeId) : null,
		row.notifyPartyId ? Party.findByPk(row.notifyPartyId) : null,
		productsBySku(s.lines.map((l) => l.sku)),
		listLots(shipmentId),
		row.palletTypeId ? PalletTypeRow.findByPk(row.palletTypeId) : null,
		cachedLoadPlan(user, shipmentId)
	]);
	const today = new Date().toISOString().slice(0, 10);
	const productIds = [...products.values()].map((p) => p.id);
	// A UN38.3 summary counts on the product or on this shipment; a proof of origin on the shipment.
	const [un383, origin] = await Promise.all([
		currentDocumentsOfKind(productIds, 'un38_3_summary', today, { shipmentId }),
		currentDocumentsOfKind([], 'proof_of_origin', today, { shipmentId })
	]);
	const un383OnShipment = un383.some((d) => d.shipmentId === shipmentId);
	const un383Products = new Set(un383.map((d) => d.productId));
	const source: DocumentSource = {
		reference: row.reference,
		status: row.status,
		incoterm: row.incoterm,
		incotermPlace: row.incotermPlace,
		currency: row.currency,
		chosenMode: row.chosenMode,
		carrier: row.carrier,
		vessel: row.vessel,
		voyageOrFlight: row.voyageOrFlight,
		bookingNumber: row.bookingNumber,
		etd: row.etd,
		eta: row.eta,
		details: {
			paymentTerms: row.paymentTerms,
			exportReason: row.exportReason,
			freightAmount: row.freightAmount,
			insuranceAmount: row.insuranceAmount,
			marks: row.marks,
			signatoryName: row.signatoryName,
			signatoryTitle: row.signatoryTitle,
			signingPlace: row.signingPlace,
			preferentialOriginClaimed: row.preferentialOriginClaimed,
			preferentialAgreement: row.preferentialAgreement,
			originStatement: row.originStatement
		},
		exporter,
		buyer,
		consignee: partyOf(consignee),
		notifyParty: partyOf(notify),
		origin: s.origin && {
			code: s.origin.code,
			name: s.origin.name,
			countryCode: s.origin.countryCode
		},
		destination: s.destination && {
			code: s.destination.code,
			name: s.destination.name,
			countryCode: s.destination.countryCode
		},
		containers: s.containers.map((c) => ({
			number: c.containerNumber,
			seal: c.sealNumber,
			type: c.containerType
		})),
		lines: s.lines.map((l) => {
			const p = products.get(l.sku.toLowerCase());
			return {
				position: l.position,
				sku: l.sku,
				description: l.description,
				hsCode: p?.hsCode ?? null,
				originCountry: p?.originCountry ?? null,
				netKgPerUnit: p?.netKgPerUnit ?? null,
				hasPackaging: l.hasPackaging,
				quantity: l.quantity,
				unitPrice: l.unitPrice,
				battery: p?.batteryConfig ?? 'none',
				batteryChemistry: p?.batteryChemistry ?? null,
				un383OnFile: un383OnShipment || (p !== undefined && un383Products.has(p.id))
			};
		}),
		measure: result,
		palletType: pallet ? pallet.name : null,
		lots: lots.map((l) => ({
			sku: l.sku,
			cartonFrom: l.cartonFrom,
			cartonTo: l.cartonTo,
			lotNumber: l.lotNumber,
			serialFrom: l.serialFrom,
			serialTo: l.serialTo
		})),
		loadPlan: loadPlanFigures(plan),
		proofOfOriginOnFile: origin.length > 0
	};
	return { source, shipmentId, exporterId: row.exporterId, version: row.version, loadPlan: plan };
}
