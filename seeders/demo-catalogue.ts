// Demo places, parties and products (invented). Place codes follow the UN/LOCODE pattern
// (country + 3 characters); products and their figures are made up for the demo.
import type { BatteryChemistry, BatteryConfig } from '../src/lib/server/db/models';

export const DEMO_PLACES = [
	{ code: 'MYPEN', name: 'Penang (port)', kind: 'seaport', countryCode: 'MY' },
	{ code: 'MYPKG', name: 'Port Klang', kind: 'seaport', countryCode: 'MY' },
	{ code: 'MYPNA', name: 'Penang International Airport', kind: 'airport', countryCode: 'MY' },
	{ code: 'VNHPH', name: 'Haiphong', kind: 'seaport', countryCode: 'VN' },
	{ code: 'VNHAN', name: 'Hanoi (Noi Bai airport)', kind: 'airport', countryCode: 'VN' },
	{ code: 'DEHAM', name: 'Hamburg', kind: 'seaport', countryCode: 'DE' },
	{ code: 'DEBRE', name: 'Bremen', kind: 'inland', countryCode: 'DE' },
	{ code: 'DEFRA', name: 'Frankfurt am Main (airport)', kind: 'airport', countryCode: 'DE' },
	{ code: 'NLRTM', name: 'Rotterdam', kind: 'seaport', countryCode: 'NL' },
	{ code: 'AUMEL', name: 'Melbourne', kind: 'seaport', countryCode: 'AU' },
	{ code: 'USCMH', name: 'Columbus, Ohio', kind: 'inland', countryCode: 'US' },
	{ code: 'USNYC', name: 'New York / Newark', kind: 'seaport', countryCode: 'US' }
] as const;

export interface DemoParty {
	key: string;
	organization: string;
	name: string;
	line1: string;
	city: string;
	postalCode?: string;
	region?: string;
	countryCode: string;
	contactName?: string;
	taxIds: { type: string; value: string }[];
}

export const DEMO_PARTIES: DemoParty[] = [
	{
		key: 'hallvik-bremen',
		organization: 'hallvik',
		name: 'Hallvik Heimtechnik GmbH — Distribution centre',
		line1: 'Am Lagerfeld 9',
		city: 'Bremen',
		postalCode: '28197',
		countryCode: 'DE',
		contactName: 'Goods-in desk',
		taxIds: [{ type: 'EORI', value: 'DE512778904336921' }]
	},
	{
		key: 'kaaiman-notify',
		organization: 'broker',
		name: 'Kaaiman Customs Services B.V.',
		line1: 'Waalhaven Zuidzijde 31',
		city: 'Rotterdam',
		postalCode: '3089 JH',
		countryCode: 'NL',
		contactName: 'Import desk',
		taxIds: [{ type: 'EORI', value: 'NL861240339' }]
	},
	{
		key: 'wattlebird-dc',
		organization: 'wattlebird',
		name: 'Wattlebird Home Retail Pty Ltd',
		line1: '4 Kingsgrove Parade',
		city: 'Dandenong South',
		postalCode: '3175',
		region: 'VIC',
		countryCode: 'AU',
		taxIds: [{ type: 'ABN', value: '63 118 402 557' }]
	},
	{
		key: 'cedarpoint-dc',
		organization: 'cedarpoint',
		name: 'Cedarpoint Living Inc. — Receiving',
		line1: '2750 Orchard Crossing Blvd',
		city: 'Columbus',
		postalCode: '43219',
		region: 'OH',
		countryCode: 'US',
		taxIds: [{ type: 'EIN', value: '47-3318825' }]
	}
];

export interface DemoProduct {
	sku: string;
	description: string;
	hsCode: string;
	originCountry: string;
	unitPrice: string;
	currency: string;
	netKgPerUnit: string;
	battery?: {
		config: BatteryConfig;
		chemistry: BatteryChemistry;
		cellWh?: string;
		batteryWh?: string;
		nominalVoltage?: string;
		capacityAh?: string;
		cellsPerBattery?: number;
		batteriesPerUnit?: number;
	};
	/** Absent for a product whose cartons are not measured yet (the demo shows the error). */
	packaging?: {
		unitsPerCarton: number;
		cartonLengthMm: number;
		cartonWidthMm: number;
		cartonHeightMm: number;
		cartonGrossKg: string;
		orientation: 'any' | 'this_way_up';
		maxLoadOnTopKg: string | null;
	};
}

export const DEMO_PRODUCTS: DemoProduct[] = [
	{
		sku: 'SLV-PBL-20',
		description: 'Pebble 20 portable speaker, rechargeable, blue',
		hsCode: '8518220000',
		originCountry: 'MY',
		unitPrice: '38.50',
		currency: 'USD',
		netKgPerUnit: '0.6200',
		battery: {
			config: 'contained',
			chemistry: 'lithium_ion',
			cellWh: '9.62',
			batteryWh: '9.62',
			nominalVoltage: '3.7',
			capacityAh: '2.6',
			cellsPerBattery: 1,
			batteriesPerUnit: 1
		},
		packaging: {
			unitsPerCarton: 12,
			cartonLengthMm: 400,
			cartonWidthMm: 300,
			cartonHeightMm: 250,
			cartonGrossKg: '8.640',
			orientation: 'this_way_up',
			maxLoadOnTopKg: '60'
		}
	},
	{
		sku: 'SLV-TWR-80',
		description: 'Tower 80 floor-standing speaker pair, mains powered',
		hsCode: '8518220000',
		originCountry: 'MY',
		unitPrice: '214.00',
		currency: 'USD',
		netKgPerUnit: '14.8000',
		packaging: {
			unitsPerCarton: 1,
			cartonLengthMm: 1150,
			cartonWidthMm: 420,
			cartonHeightMm: 380,
			cartonGrossKg: '18.200',
			orientation: 'this_way_up',
			maxLoadOnTopKg: '40'
		}
	},
	{
		sku: 'SLV-SNS-TH1',
		description: 'Nook temperature and humidity sensor, battery powered (coin cell)',
		hsCode: '9025800000',
		originCountry: 'VN',
		unitPrice: '6.90',
		currency: 'USD',
		netKgPerUnit: '0.0420',
		battery: {
			config: 'packed_with',
			chemistry: 'lithium_metal',
			nominalVoltage: '3.0',
			cellsPerBattery: 1,
			batteriesPerUnit: 1
		},
		packaging: {
			unitsPerCarton: 100,
			cartonLengthMm: 390,
			cartonWidthMm: 290,
			cartonHeightMm: 210,
			cartonGrossKg: '5.300',
			orientation: 'any',
			maxLoadOnTopKg: '80'
		}
	},
	{
		sku: 'SLV-SNS-DW2',
		description: 'Latch door and window contact sensor, white',
		hsCode: '8531100000',
		originCountry: 'VN',
		unitPrice: '4.75',
		currency: 'USD',
		netKgPerUnit: '0.0310',
		packaging: {
			unitsPerCarton: 120,
			cartonLengthMm: 380,
			cartonWidthMm: 280,
			cartonHeightMm: 200,
			cartonGrossKg: '4.820',
			orientation: 'any',
			maxLoadOnTopKg: '80'
		}
	},
	{
		sku: 'SLV-PWR-20K',
		description: 'Ridge 20000 mAh power bank, USB-C',
		hsCode: '8507600000',
		originCountry: 'MY',
		unitPrice: '17.20',
		currency: 'USD',
		netKgPerUnit: '0.3900',
		battery: {
			config: 'standalone',
			chemistry: 'lithium_ion',
			cellWh: '18.5',
			batteryWh: '74',
			nominalVoltage: '3.7',
			capacityAh: '20',
			cellsPerBattery: 4,
			batteriesPerUnit: 1
		},
		packaging: {
			unitsPerCarton: 30,
			cartonLengthMm: 420,
			cartonWidthMm: 320,
			cartonHeightMm: 220,
			cartonGrossKg: '12.900',
			orientation: 'this_way_up',
			maxLoadOnTopKg: '50'
		}
	},
	{
		sku: 'SLV-HUB-01',
		description: 'Hearth smart-home hub, mains powered (packaging not yet measured)',
		hsCode: '8517620000',
		originCountry: 'VN',
		unitPrice: '29.00',
		currency: 'USD',
		netKgPerUnit: '0.2800'
	}
];
