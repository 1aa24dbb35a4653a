/**
 * An invented shipment for the documents' tests (demo data only; any likeness is unintended).
 *
 * Pure module: no framework imports.
 */
import { measure, type MeasureInput } from '../packing';
import type { DocumentSource, SourceParty } from './source';

const party = (name: string, city: string, countryCode: string, tax?: string): SourceParty => ({
	name,
	line1: '1 Example Way',
	line2: null,
	postalCode: '10000',
	city,
	region: null,
	countryCode,
	taxIds: tax ? [{ type: 'VAT', value: tax }] : [],
	contactName: null,
	email: null,
	phone: null
});

export const SPEAKER = {
	unitsPerCarton: 4,
	lengthMm: 600,
	widthMm: 400,
	heightMm: 300,
	cartonGrossKg: '9.650',
	orientation: 'this_way_up' as const,
	maxLoadOnTopKg: '120'
};
export const SENSOR = {
	unitsPerCarton: 50,
	lengthMm: 400,
	widthMm: 300,
	heightMm: 200,
	cartonGrossKg: '6.125',
	orientation: 'any' as const,
	maxLoadOnTopKg: '200'
};
export const EUR_PALLET = {
	lengthMm: 1200,
	widthMm: 800,
	deckHeightMm: 144,
	tareKg: '25',
	maxGrossKg: '1525',
	maxLoadedHeightMm: 1800
};

export function measureInput(withPallet: boolean): MeasureInput {
	return {
		products: [
			{ sku: 'SPK-200', netKgPerUnit: '2.1', packaging: SPEAKER },
			{ sku: 'SNS-10', netKgPerUnit: '0.105', packaging: SENSOR }
		],
		lines: [
			{ sku: 'SPK-200', quantity: 162 },
			{ sku: 'SNS-10', quantity: 1220 }
		],
		...(withPallet ? { pallet: EUR_PALLET } : {})
	};
}

export function sampleSource(overrides: Partial<DocumentSource> = {}): DocumentSource {
	return {
		reference: 'SHP-2026-00042',
		status: 'booked',
		incoterm: 'CIF',
		incotermPlace: 'Rotterdam',
		currency: 'EUR',
		chosenMode: 'sea_fcl',
		carrier: 'Example Line',
		vessel: 'Northern Example',
		voyageOrFlight: '612W',
		bookingNumber: 'BK123456',
		etd: '2026-12-10',
		eta: '2027-01-08',
		details: {
			paymentTerms: '30 days from the bill of lading date',
			exportReason: 'Sale',
			freightAmount: '1850.00',
			insuranceAmount: '96.35',
			marks: null,
			signatoryName: 'Mira Example',
			signatoryTitle: 'Export manager',
			signingPlace: 'Penang',
			preferentialOriginClaimed: false,
			preferentialAgreement: null,
			originStatement: null
		},
		exporter: party('Example Audio Sdn Bhd', 'Penang', 'MY', 'MY-1234'),
		buyer: party('Example Buyer BV', 'Rotterdam', 'NL', 'NL123'),
		consignee: party('Example Buyer BV', 'Rotterdam', 'NL'),
		notifyParty: null,
		origin: { code: 'MYPEN', name: 'Penang', countryCode: 'MY' },
		destination: { code: 'NLRTM', name: 'Rotterdam', countryCode: 'NL' },
		containers: [{ number: 'CSQU3054383', seal: 'SL-778812', type: '40 ft standard' }],
		lines: [
			{
				position: 1,
				sku: 'SPK-200',
				description: 'Bookshelf speaker, pair',
				hsCode: '851822',
				originCountry: 'MY',
				netKgPerUnit: '2.1',
				hasPackaging: true,
				quantity: 162,
				unitPrice: '48.3350',
				battery: 'none',
				batteryChemistry: null,
				un383OnFile: false
			},
			{
				position: 2,
				sku: 'SNS-10',
				description: 'Room climate sensor',
				hsCode: '9025198000',
				originCountry: 'TH',
				netKgPerUnit: '0.105',
				hasPackaging: true,
				quantity: 1220,
				unitPrice: '7.1250',
				battery: 'none',
				batteryChemistry: null,
				un383OnFile: false
			}
		],
		measure: measure(measureInput(true)),
		palletType: 'EUR 1200 × 800',
		lots: [
			{
				sku: 'SNS-10',
				cartonFrom: 42,
				cartonTo: 51,
				lotNumber: 'L2611',
				serialFrom: 'S000001',
				serialTo: 'S000500'
			}
		],
		loadPlan: null,
		proofOfOriginOnFile: false,
		...overrides
	};
}
