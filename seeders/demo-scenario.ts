// The demo scenario: invented companies, people and addresses. Any likeness to a real firm is
// unintended. E-mail addresses use the reserved .example domain (RFC 2606).
import type { AddressPurpose } from '../src/lib/server/db/models';
import type { OrganizationKind, Role } from '../src/lib/roles';

export const DEMO_PASSWORD = 'Landfall-demo-2026';

export interface DemoOrganization {
	key: string;
	name: string;
	kind: OrganizationKind;
	countryCode: string;
	addresses: {
		purpose: AddressPurpose;
		label?: string;
		line1: string;
		line2?: string;
		city: string;
		postalCode?: string;
		region?: string;
		countryCode: string;
	}[];
	taxIds: { type: string; value: string; countryCode?: string }[];
}

export const DEMO_ORGANIZATIONS: DemoOrganization[] = [
	{
		key: 'exporter',
		name: 'Solvrae Electronics Sdn. Bhd.',
		kind: 'exporter',
		countryCode: 'MY',
		addresses: [
			{
				purpose: 'registered',
				label: 'Head office',
				line1: '18 Jalan Kelisa Emas 4',
				city: 'Bayan Lepas',
				postalCode: '11900',
				region: 'Pulau Pinang',
				countryCode: 'MY'
			},
			{
				purpose: 'factory',
				label: 'Penang works (speakers, power banks)',
				line1: 'Plot 62, Lorong Perindustrian Jati 2',
				city: 'Bayan Lepas',
				postalCode: '11900',
				region: 'Pulau Pinang',
				countryCode: 'MY'
			},
			{
				purpose: 'factory',
				label: 'Bac Ninh works (sensors)',
				line1: 'Lot C7, Que Vo Industrial Park Extension',
				city: 'Que Vo',
				region: 'Bac Ninh',
				countryCode: 'VN'
			}
		],
		taxIds: [
			{ type: 'SST', value: 'P11-2207-32000418', countryCode: 'MY' },
			{ type: 'MST', value: '2301099817', countryCode: 'VN' },
			{ type: 'EORI', value: 'NL863201447', countryCode: 'NL' }
		]
	},
	{
		key: 'hallvik',
		name: 'Hallvik Heimtechnik GmbH',
		kind: 'customer',
		countryCode: 'DE',
		addresses: [
			{
				purpose: 'registered',
				line1: 'Billstraße 211',
				city: 'Hamburg',
				postalCode: '20539',
				countryCode: 'DE'
			},
			{
				purpose: 'delivery',
				label: 'Distribution centre',
				line1: 'Am Lagerfeld 9',
				city: 'Bremen',
				postalCode: '28197',
				countryCode: 'DE'
			}
		],
		taxIds: [
			{ type: 'VAT', value: 'DE318204771', countryCode: 'DE' },
			{ type: 'EORI', value: 'DE512778904336921', countryCode: 'DE' }
		]
	},
	{
		key: 'wattlebird',
		name: 'Wattlebird Home Retail Pty Ltd',
		kind: 'customer',
		countryCode: 'AU',
		addresses: [
			{
				purpose: 'registered',
				line1: '4 Kingsgrove Parade',
				city: 'Dandenong South',
				postalCode: '3175',
				region: 'VIC',
				countryCode: 'AU'
			}
		],
		taxIds: [{ type: 'ABN', value: '63 118 402 557', countryCode: 'AU' }]
	},
	{
		key: 'cedarpoint',
		name: 'Cedarpoint Living Inc.',
		kind: 'customer',
		countryCode: 'US',
		addresses: [
			{
				purpose: 'registered',
				line1: '2750 Orchard Crossing Blvd',
				line2: 'Suite 400',
				city: 'Columbus',
				postalCode: '43219',
				region: 'OH',
				countryCode: 'US'
			}
		],
		taxIds: [{ type: 'EIN', value: '47-3318825', countryCode: 'US' }]
	},
	{
		key: 'broker',
		name: 'Kaaiman Customs Services B.V.',
		kind: 'broker',
		countryCode: 'NL',
		addresses: [
			{
				purpose: 'office',
				line1: 'Waalhaven Zuidzijde 31',
				city: 'Rotterdam',
				postalCode: '3089 JH',
				countryCode: 'NL'
			}
		],
		taxIds: [
			{ type: 'VAT', value: 'NL861240339B01', countryCode: 'NL' },
			{ type: 'EORI', value: 'NL861240339', countryCode: 'NL' }
		]
	},
	{
		key: 'forwarder',
		name: 'Lantern Quay Forwarding Sdn. Bhd.',
		kind: 'forwarder',
		countryCode: 'MY',
		addresses: [
			{
				purpose: 'office',
				line1: '7 Lebuh Pantai',
				city: 'George Town',
				postalCode: '10300',
				region: 'Pulau Pinang',
				countryCode: 'MY'
			}
		],
		taxIds: []
	}
];

export interface DemoUser {
	email: string;
	name: string;
	role: Role;
	organization: string;
	disabled?: boolean;
}

export const DEMO_USERS: DemoUser[] = [
	{
		email: 'admin@solvrae.example',
		name: 'Farah Iskandar',
		role: 'admin',
		organization: 'exporter'
	},
	{
		email: 'coordinator@solvrae.example',
		name: 'Daniel Tan Wei Jie',
		role: 'coordinator',
		organization: 'exporter'
	},
	{
		email: 'finance@solvrae.example',
		name: 'Ooi Mei Ling',
		role: 'finance',
		organization: 'exporter'
	},
	{
		email: 'broker@kaaiman.example',
		name: 'Joost van Rijswijk',
		role: 'broker',
		organization: 'broker'
	},
	{
		email: 'buyer@hallvik.example',
		name: 'Katrin Albers',
		role: 'customer',
		organization: 'hallvik'
	},
	{
		email: 'buyer@wattlebird.example',
		name: 'Liam Ferraro',
		role: 'customer',
		organization: 'wattlebird'
	},
	{
		email: 'buyer@cedarpoint.example',
		name: 'Renee Okafor',
		role: 'customer',
		organization: 'cedarpoint'
	},
	{
		email: 'former.planner@solvrae.example',
		name: 'Hafiz Rahman',
		role: 'coordinator',
		organization: 'exporter',
		disabled: true
	}
];
