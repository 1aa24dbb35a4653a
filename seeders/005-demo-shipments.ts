import type { Sequelize } from 'sequelize';
import { loadSessionUser } from '../src/lib/server/auth/session-user';
import {
	ContainerTypeRow,
	Organization,
	Party,
	Place,
	Product,
	Shipment,
	User
} from '../src/lib/server/db/models';
import {
	addContainer,
	changeStatus,
	createShipment,
	replaceLines,
	updatePaperDetails
} from '../src/lib/server/services/shipments';
import { addLot } from '../src/lib/server/services/shipment-lots';
import { issuePapers } from '../src/lib/server/services/documents/issue';
import type { ShipmentStatus } from '../src/lib/trade/shipment-status';

// What the demo papers print; the signatory is an invented person.
const PAPERS = {
	exportReason: 'Sale',
	freightAmount: '',
	insuranceAmount: '',
	marks: '',
	signatoryName: 'Nurul Aisyah Rahim',
	signatoryTitle: 'Export coordinator',
	signingPlace: 'Bayan Lepas, Penang',
	preferentialOriginClaimed: false,
	preferentialAgreement: '',
	originStatement: ''
};

// A few demo shipments, created through the same services the app uses. Idempotent: each is
// found again by its notes marker. Container numbers are invented but carry valid ISO 6346 digits.
const DEMO = [
	{
		key: 'hallvik-speakers',
		customer: 'Hallvik Heimtechnik GmbH',
		broker: 'Kaaiman Customs Services B.V.',
		consignee: 'Hallvik Heimtechnik GmbH — Distribution centre',
		notify: 'Kaaiman Customs Services B.V.',
		incoterm: 'FCA' as const,
		incotermPlace: 'Port Klang',
		origin: 'MYPKG',
		destination: 'DEHAM',
		modes: ['sea_fcl', 'sea_lcl', 'air'] as const,
		chosen: 'sea_fcl' as const,
		etdDays: 9,
		transitDays: 28,
		lines: [
			['SLV-PBL-20', 1440],
			['SLV-TWR-80', 60],
			['SLV-PWR-20K', 900]
		] as const,
		status: ['booked'] as ShipmentStatus[],
		paymentTerms: '30 days net from the bill of lading date',
		containers: [{ number: 'CSQU3054383', type: 'C40HC', seal: 'SLV-0042117' }],
		lots: [
			{
				sku: 'SLV-PBL-20',
				cartonFrom: 1,
				cartonTo: 60,
				lotNumber: 'PB20-2611-A',
				serialFrom: 'PB20-000001',
				serialTo: 'PB20-000720'
			},
			{
				sku: 'SLV-PBL-20',
				cartonFrom: 61,
				cartonTo: 120,
				lotNumber: 'PB20-2611-B',
				serialFrom: 'PB20-000721',
				serialTo: 'PB20-001440'
			}
		]
	},
	{
		key: 'wattlebird-sensors',
		customer: 'Wattlebird Home Retail Pty Ltd',
		consignee: 'Wattlebird Home Retail Pty Ltd',
		incoterm: 'CPT' as const,
		incotermPlace: 'Melbourne',
		origin: 'VNHAN',
		destination: 'AUMEL',
		modes: ['air', 'sea_lcl'] as const,
		chosen: null,
		etdDays: 20,
		transitDays: 3,
		lines: [
			['SLV-SNS-TH1', 2400],
			['SLV-SNS-DW2', 1800]
		] as const,
		status: [] as ShipmentStatus[],
		containers: []
	},
	{
		key: 'cedarpoint-mixed',
		customer: 'Cedarpoint Living Inc.',
		consignee: 'Cedarpoint Living Inc. — Receiving',
		incoterm: 'FOB' as const,
		incotermPlace: 'Penang',
		origin: 'MYPEN',
		destination: 'USNYC',
		modes: ['sea_fcl'] as const,
		chosen: 'sea_fcl' as const,
		etdDays: -12,
		transitDays: 30,
		lines: [
			['SLV-PBL-20', 2880],
			['SLV-PWR-20K', 600]
		] as const,
		status: ['booked', 'documents_issued', 'in_transit'] as ShipmentStatus[],
		paymentTerms: 'Documentary collection, documents against payment',
		containers: [{ number: 'LDFU1234567', type: 'C40GP', seal: 'SLV-0041980' }]
	}
];

const day = (offset: number) =>
	new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);

export async function seed(_sequelize: Sequelize): Promise<void> {
	const coordinator = await User.findOne({
		where: { email: 'coordinator@solvrae.example' },
		rejectOnEmpty: true
	});
	const actor = (await loadSessionUser(coordinator.id))!;
	const orgId = async (name: string) =>
		(await Organization.findOne({ where: { name }, rejectOnEmpty: true })).id;
	const partyId = async (name: string) =>
		(await Party.findOne({ where: { name }, rejectOnEmpty: true })).id;
	for (const demo of DEMO) {
		const marker = `Demo scenario: ${demo.key}`;
		if (await Shipment.findOne({ where: { notes: marker } })) continue;
		const place = async (code: string) =>
			(await Place.findOne({ where: { code }, rejectOnEmpty: true })).id;
		const created = await createShipment(
			actor,
			{
				customerId: await orgId(demo.customer),
				brokerId: 'broker' in demo && demo.broker ? await orgId(demo.broker) : '',
				consigneeId: await partyId(demo.consignee),
				notifyPartyId: 'notify' in demo && demo.notify ? await partyId(demo.notify) : '',
				incoterm: demo.incoterm,
				incotermPlace: demo.incotermPlace,
				originId: await place(demo.origin),
				destinationId: await place(demo.destination),
				modesConsidered: [...demo.modes],
				chosenMode: demo.chosen ?? '',
				currency: 'USD',
				palletTypeId: '',
				carrier: demo.chosen === 'sea_fcl' ? 'Meridian Blue Line (demo carrier)' : '',
				vessel: '',
				voyageOrFlight: '',
				bookingNumber: '',
				etd: day(demo.etdDays),
				eta: day(demo.etdDays + demo.transitDays),
				notes: marker,
				version: 0
			},
			null
		);
		if (!created.ok) throw new Error(`demo shipment ${demo.key}: ${created.message}`);
		const id = created.value.id;
		let version = 0;
		const lines = [];
		for (const [sku, quantity] of demo.lines) {
			const product = await Product.findOne({ where: { sku }, rejectOnEmpty: true });
			lines.push({ productId: product.id, quantity, unitPrice: '' });
		}
		const saved = await replaceLines(actor, id, { lines, version: version++ }, null);
		if (!saved.ok) throw new Error(`demo lines ${demo.key}: ${saved.message}`);
		for (const lot of ('lots' in demo && demo.lots) || []) {
			const product = await Product.findOne({ where: { sku: lot.sku }, rejectOnEmpty: true });
			const added = await addLot(actor, id, { ...lot, productId: product.id, version }, null);
			if (!added.ok) throw new Error(`demo lot ${demo.key}: ${added.message}`);
		}
		for (const container of demo.containers) {
			const type = await ContainerTypeRow.findOne({
				where: { code: container.type },
				rejectOnEmpty: true
			});
			const added = await addContainer(
				actor,
				id,
				{
					containerNumber: container.number,
					containerTypeId: type.id,
					sealNumber: container.seal,
					version: version++
				},
				null
			);
			if (!added.ok) throw new Error(`demo container ${demo.key}: ${added.message}`);
		}
		if ('paymentTerms' in demo && demo.paymentTerms) {
			const papers = { ...PAPERS, paymentTerms: demo.paymentTerms, version: version++ };
			const saved = await updatePaperDetails(actor, id, papers, null);
			if (!saved.ok) throw new Error(`demo papers ${demo.key}: ${saved.message}`);
		}
		for (const to of demo.status) {
			// The papers are issued for real (numbered PDFs), which moves the shipment on.
			const changed =
				to === 'documents_issued'
					? await issuePapers(
							actor,
							id,
							{ kinds: ['commercial_invoice', 'packing_list'], reason: '' },
							null
						)
					: await changeStatus(actor, id, { to, note: '', version }, null);
			version++;
			if (!changed.ok) throw new Error(`demo status ${demo.key}: ${changed.message}`);
		}
	}
}
