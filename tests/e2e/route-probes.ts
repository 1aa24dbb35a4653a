import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { expect, type APIRequestContext } from '@playwright/test';
import { DEMO } from './helpers';

// Every page, form action and API route with the probes that reach it, shared by the access spec
// (route-access.spec.ts: each probe as every role) and the fuzzer (fuzz.spec.ts: hostile input
// to every mutating probe and query). findRoutes reads src/routes, so a route without probes fails.

export type Who = 'anonymous' | 'admin' | 'coordinator' | 'finance' | 'broker' | 'customer';
export const WHO: Who[] = ['anonymous', 'admin', 'coordinator', 'finance', 'broker', 'customer'];
export type Expect = Partial<Record<Who, number>> & { default: number };

const SIGNED_IN_200: Expect = { anonymous: 303, default: 200 };
const STAFF_PAGE: Expect = { anonymous: 303, broker: 403, customer: 403, default: 200 };
const ADMIN_PAGE: Expect = { anonymous: 303, admin: 200, default: 403 };
const ADMIN_API: Expect = { anonymous: 401, admin: 200, default: 403 };
const API_200: Expect = { anonymous: 401, default: 200 };
/** Own organization: everyone signed in; customer and broker only see their own. */
const OWN_ORG_PAGE: Expect = { anonymous: 303, default: 200 };
/** Another customer's organization: invisible (404) to customers and brokers. */
const OTHER_ORG_PAGE: Expect = { anonymous: 303, broker: 404, customer: 404, default: 200 };
const OTHER_ORG_API: Expect = { anonymous: 401, broker: 404, customer: 404, default: 200 };
const EDITOR_PAGE: Expect = { anonymous: 303, admin: 200, coordinator: 200, default: 403 };
/** An editor's empty form is rejected field by field (400); other roles never reach the action. */
const EDITOR_ACTION: Expect = { anonymous: 303, admin: 400, coordinator: 400, default: 403 };
const EDITOR_API: Expect = { anonymous: 401, admin: 400, coordinator: 400, default: 403 };
const READ_PRODUCTS: Expect = { anonymous: 303, customer: 403, default: 200 };
/** The other customer's shipment: a 404 to customers and to brokers not assigned to it. */
const OTHER_SHIPMENT_PAGE: Expect = { anonymous: 303, broker: 404, customer: 404, default: 200 };
const OTHER_SHIPMENT_API: Expect = { anonymous: 401, broker: 404, customer: 404, default: 200 };

/** Landed-cost reference data: finance and admins edit, coordinators read. */
const REFDATA_PAGE: Expect = { anonymous: 303, broker: 403, customer: 403, default: 200 };
const REFDATA_ACTION: Expect = { anonymous: 303, admin: 400, finance: 400, default: 403 };
/** Deposit requests and cancels: finance and coordinators (an empty form is a 400). */
const DEPOSIT_STAFF_ACTION: Expect = {
	anonymous: 303,
	finance: 400,
	coordinator: 400,
	default: 403
};

const LIFECYCLE = ['retire', 'reinstate', 'remove'] as const;

/** Supporting documents: coordinators and admins add and retire; an empty form is a 400. */
const SUPPORTING_ACTIONS = (page: string): Probe[] => [
	{ method: 'POST', path: `${page}?/uploadSupporting`, form: { kind: '' }, expect: EDITOR_ACTION },
	{
		method: 'POST',
		path: `${page}?/retireSupporting`,
		form: { documentId: 'x' },
		expect: EDITOR_ACTION
	}
];

export interface Probe {
	method: 'GET' | 'POST' | 'PATCH' | 'PUT';
	/**
	 * Path with placeholders :own (the user's organization), :other (another customer), :user,
	 * :ship (Hallvik's shipment, broker Kaaiman assigned) and :otherShip (Wattlebird's); :cedar
	 * (Cedarpoint's, papers issued, no broker), :cedarDoc (its first paper) and :cedarSupport (its
	 * seeded certificate of origin); :place,
	 * :party, :pallet, :container, :tariff, :rateCard, :countryRule, :fee and :deMinimis (the
	 * first listed).
	 */
	path: string;
	expect: Expect;
	body?: Record<string, unknown>;
	form?: Record<string, string>;
}

/** Route id (as in src/routes, groups removed) → the probes that cover it. */
export const ROUTES: Record<string, { page?: Probe[]; actions?: Probe[]; api?: Probe[] }> = {
	'/': { page: [{ method: 'GET', path: '/', expect: SIGNED_IN_200 }] },
	'/signin': {
		page: [{ method: 'GET', path: '/signin', expect: { anonymous: 200, default: 303 } }],
		actions: [] // covered by sign-in.spec.ts
	},
	'/signout': {
		page: [{ method: 'GET', path: '/signout', expect: SIGNED_IN_200 }],
		actions: [] // covered by sign-in.spec.ts
	},
	'/organizations': { page: [{ method: 'GET', path: '/organizations', expect: STAFF_PAGE }] },
	'/organizations/[organizationId=uuid]': {
		page: [
			{ method: 'GET', path: '/organizations/:own', expect: OWN_ORG_PAGE },
			{ method: 'GET', path: '/organizations/:other', expect: OTHER_ORG_PAGE }
		]
	},
	'/admin/users': {
		page: [{ method: 'GET', path: '/admin/users', expect: ADMIN_PAGE }],
		actions: [
			{
				method: 'POST',
				path: '/admin/users?/create',
				form: { name: '' },
				// admin: 400 (the empty form is rejected field by field); others never reach the action
				expect: { anonymous: 303, admin: 400, default: 403 }
			},
			{
				method: 'POST',
				path: '/admin/users?/invite',
				form: { name: '' },
				expect: { anonymous: 303, admin: 400, default: 403 }
			}
		]
	},
	'/admin/users/[userId=uuid]': {
		page: [{ method: 'GET', path: '/admin/users/:user', expect: ADMIN_PAGE }],
		actions: [
			{
				method: 'POST',
				path: '/admin/users/:user?/save',
				form: { name: '' },
				expect: { anonymous: 303, admin: 400, default: 403 }
			},
			{
				method: 'POST',
				path: '/admin/users/:user?/issueToken',
				form: { name: '' },
				expect: { anonymous: 303, admin: 400, default: 403 }
			},
			{
				method: 'POST',
				path: '/admin/users/:user?/revokeToken',
				form: { tokenId: 'x' },
				expect: { anonymous: 303, admin: 400, default: 403 }
			},
			// admin: a new set-password link is e-mailed (the current password keeps working).
			{
				method: 'POST',
				path: '/admin/users/:user?/reinvite',
				form: {},
				expect: { anonymous: 303, admin: 200, default: 403 }
			}
		]
	},
	'/admin/audit': {
		page: [
			{ method: 'GET', path: '/admin/audit', expect: ADMIN_PAGE },
			{ method: 'GET', path: '/admin/audit?page=2', expect: ADMIN_PAGE }
		]
	},
	'/admin/mail': { page: [{ method: 'GET', path: '/admin/mail', expect: ADMIN_PAGE }] },
	// Public: the token is the proof. An unknown one shows a page saying so; its form is refused.
	'/set-password/[token]': {
		page: [
			{
				method: 'GET',
				path: '/set-password/not-a-real-invitation-token-0000',
				expect: { default: 200 }
			}
		],
		actions: [
			{
				method: 'POST',
				path: '/set-password/not-a-real-invitation-token-0000',
				form: { password: 'A-long-enough-password', confirm: 'A-long-enough-password' },
				expect: { default: 400 }
			}
		]
	},
	'/products': { page: [{ method: 'GET', path: '/products', expect: READ_PRODUCTS }] },
	'/products/new': {
		page: [{ method: 'GET', path: '/products/new', expect: EDITOR_PAGE }],
		actions: [{ method: 'POST', path: '/products/new', form: { sku: '' }, expect: EDITOR_ACTION }]
	},
	'/products/[productId=uuid]': {
		page: [{ method: 'GET', path: '/products/:product', expect: READ_PRODUCTS }],
		actions: [
			{
				method: 'POST',
				path: '/products/:product?/save',
				form: { sku: '' },
				expect: EDITOR_ACTION
			},
			...SUPPORTING_ACTIONS('/products/:product')
		]
	},
	// No document has this id: a 404 to everyone signed in, so ids confirm nothing.
	'/products/[productId=uuid]/supporting/[documentId=uuid]': {
		api: [
			{
				method: 'GET',
				path: '/products/:product/supporting/00000000-0000-4000-8000-000000000000',
				expect: { anonymous: 303, default: 404 }
			}
		]
	},
	'/shipments/[shipmentId=uuid]/supporting/[documentId=uuid]': {
		api: [
			{
				method: 'GET',
				path: '/shipments/:ship/supporting/00000000-0000-4000-8000-000000000000',
				expect: { anonymous: 303, default: 404 }
			},
			// Cedarpoint's document: staff download it; Hallvik's buyer and Kaaiman get a 404.
			{
				method: 'GET',
				path: '/shipments/:cedar/supporting/:cedarSupport',
				expect: OTHER_SHIPMENT_PAGE
			}
		]
	},
	'/shipments': {
		page: [
			{ method: 'GET', path: '/shipments', expect: SIGNED_IN_200 },
			{
				method: 'GET',
				path: '/shipments?status=booked&mode=air&q=SHP&sort=etd&dir=asc&page=1&pageSize=10',
				expect: SIGNED_IN_200
			}
		]
	},
	'/places': {
		page: [{ method: 'GET', path: '/places', expect: READ_PRODUCTS }],
		actions: [{ method: 'POST', path: '/places', form: { code: '' }, expect: EDITOR_ACTION }]
	},
	'/parties': {
		page: [{ method: 'GET', path: '/parties', expect: READ_PRODUCTS }],
		actions: [{ method: 'POST', path: '/parties', form: { name: '' }, expect: EDITOR_ACTION }]
	},
	'/places/[placeId=uuid]': {
		page: [{ method: 'GET', path: '/places/:place', expect: READ_PRODUCTS }],
		actions: [
			{ method: 'POST', path: '/places/:place?/save', form: { code: '' }, expect: EDITOR_ACTION },
			// A malformed version never reaches the service: editors 400, nothing changes.
			...LIFECYCLE.map((a) => ({
				method: 'POST' as const,
				path: `/places/:place?/${a}`,
				form: { version: 'x' },
				expect: EDITOR_ACTION
			}))
		]
	},
	'/parties/[partyId=uuid]': {
		page: [{ method: 'GET', path: '/parties/:party', expect: READ_PRODUCTS }],
		actions: [
			{ method: 'POST', path: '/parties/:party?/save', form: { name: '' }, expect: EDITOR_ACTION },
			...LIFECYCLE.map((a) => ({
				method: 'POST' as const,
				path: `/parties/:party?/${a}`,
				form: { version: 'x' },
				expect: EDITOR_ACTION
			}))
		]
	},
	'/equipment': { page: [{ method: 'GET', path: '/equipment', expect: EDITOR_PAGE }] },
	'/equipment/pallet-types/new': {
		page: [{ method: 'GET', path: '/equipment/pallet-types/new', expect: EDITOR_PAGE }],
		actions: [
			{
				method: 'POST',
				path: '/equipment/pallet-types/new',
				form: { code: '' },
				expect: EDITOR_ACTION
			}
		]
	},
	'/equipment/pallet-types/[palletTypeId=uuid]': {
		page: [{ method: 'GET', path: '/equipment/pallet-types/:pallet', expect: EDITOR_PAGE }],
		actions: [
			{
				method: 'POST',
				path: '/equipment/pallet-types/:pallet',
				form: { code: '' },
				expect: EDITOR_ACTION
			}
		]
	},
	'/equipment/container-types/new': {
		page: [{ method: 'GET', path: '/equipment/container-types/new', expect: EDITOR_PAGE }],
		actions: [
			{
				method: 'POST',
				path: '/equipment/container-types/new',
				form: { code: '' },
				expect: EDITOR_ACTION
			}
		]
	},
	'/equipment/container-types/[containerTypeId=uuid]': {
		page: [{ method: 'GET', path: '/equipment/container-types/:container', expect: EDITOR_PAGE }],
		actions: [
			{
				method: 'POST',
				path: '/equipment/container-types/:container',
				form: { code: '' },
				expect: EDITOR_ACTION
			}
		]
	},
	'/reference/exchange-rates': {
		page: [
			{ method: 'GET', path: '/reference/exchange-rates', expect: REFDATA_PAGE },
			{ method: 'GET', path: '/reference/exchange-rates?pair=USD-EUR', expect: REFDATA_PAGE }
		],
		actions: [
			{
				method: 'POST',
				path: '/reference/exchange-rates?/add',
				form: { base: '' },
				expect: REFDATA_ACTION
			},
			{
				method: 'POST',
				path: '/reference/exchange-rates?/import',
				form: { source: '' },
				expect: REFDATA_ACTION
			}
		]
	},
	'/reference/tariffs': {
		page: [
			{ method: 'GET', path: '/reference/tariffs', expect: REFDATA_PAGE },
			{ method: 'GET', path: '/reference/tariffs?destination=AU', expect: REFDATA_PAGE }
		],
		actions: [
			{ method: 'POST', path: '/reference/tariffs', form: { hsPrefix: '' }, expect: REFDATA_ACTION }
		]
	},
	'/reference/tariffs/[tariffId=uuid]': {
		page: [{ method: 'GET', path: '/reference/tariffs/:tariff', expect: REFDATA_PAGE }],
		actions: [
			{
				method: 'POST',
				path: '/reference/tariffs/:tariff?/save',
				form: { hsPrefix: '' },
				expect: REFDATA_ACTION
			},
			{
				method: 'POST',
				path: '/reference/tariffs/:tariff?/retire',
				form: { validTo: 'x' },
				expect: REFDATA_ACTION
			}
		]
	},
	'/reference/rate-cards': {
		page: [
			{ method: 'GET', path: '/reference/rate-cards', expect: REFDATA_PAGE },
			{ method: 'GET', path: '/reference/rate-cards?mode=air&lane=MY-DE', expect: REFDATA_PAGE }
		],
		actions: [
			{
				method: 'POST',
				path: '/reference/rate-cards',
				form: { laneFrom: '' },
				expect: REFDATA_ACTION
			}
		]
	},
	'/reference/rate-cards/[rateCardId=uuid]': {
		page: [{ method: 'GET', path: '/reference/rate-cards/:rateCard', expect: REFDATA_PAGE }],
		actions: [
			{
				method: 'POST',
				path: '/reference/rate-cards/:rateCard?/save',
				form: { laneFrom: '' },
				expect: REFDATA_ACTION
			},
			{
				method: 'POST',
				path: '/reference/rate-cards/:rateCard?/retire',
				form: { validTo: 'x' },
				expect: REFDATA_ACTION
			}
		]
	},
	'/reference/country-rules': {
		page: [
			{ method: 'GET', path: '/reference/country-rules', expect: REFDATA_PAGE },
			{ method: 'GET', path: '/reference/country-rules?country=US', expect: REFDATA_PAGE }
		],
		actions: [
			{
				method: 'POST',
				path: '/reference/country-rules?/addRule',
				form: { country: '' },
				expect: REFDATA_ACTION
			},
			{
				method: 'POST',
				path: '/reference/country-rules?/addFee',
				form: { code: '' },
				expect: REFDATA_ACTION
			},
			{
				method: 'POST',
				path: '/reference/country-rules?/addDeMinimis',
				form: { country: '' },
				expect: REFDATA_ACTION
			}
		]
	},
	'/reference/country-rules/[ruleId=uuid]': {
		page: [{ method: 'GET', path: '/reference/country-rules/:countryRule', expect: REFDATA_PAGE }],
		actions: [
			{
				method: 'POST',
				path: '/reference/country-rules/:countryRule?/save',
				form: { country: '' },
				expect: REFDATA_ACTION
			},
			{
				method: 'POST',
				path: '/reference/country-rules/:countryRule?/retire',
				form: { validTo: 'x' },
				expect: REFDATA_ACTION
			}
		]
	},
	'/reference/country-rules/fees/[feeId=uuid]': {
		page: [{ method: 'GET', path: '/reference/country-rules/fees/:fee', expect: REFDATA_PAGE }],
		actions: [
			{
				method: 'POST',
				path: '/reference/country-rules/fees/:fee?/save',
				form: { code: '' },
				expect: REFDATA_ACTION
			},
			{
				method: 'POST',
				path: '/reference/country-rules/fees/:fee?/retire',
				form: { validTo: 'x' },
				expect: REFDATA_ACTION
			}
		]
	},
	'/reference/country-rules/de-minimis/[deMinimisId=uuid]': {
		page: [
			{
				method: 'GET',
				path: '/reference/country-rules/de-minimis/:deMinimis',
				expect: REFDATA_PAGE
			}
		],
		actions: [
			{
				method: 'POST',
				path: '/reference/country-rules/de-minimis/:deMinimis?/save',
				form: { country: '' },
				expect: REFDATA_ACTION
			},
			{
				method: 'POST',
				path: '/reference/country-rules/de-minimis/:deMinimis?/retire',
				form: { validTo: 'x' },
				expect: REFDATA_ACTION
			}
		]
	},
	'/reference/settings': {
		page: [{ method: 'GET', path: '/reference/settings', expect: REFDATA_PAGE }],
		actions: [
			{
				method: 'POST',
				path: '/reference/settings',
				form: { insuranceRatePercent: '' },
				expect: REFDATA_ACTION
			}
		]
	},
	'/trace': { page: [{ method: 'GET', path: '/trace?q=PB20-000001', expect: STAFF_PAGE }] },
	'/shipments/new': {
		page: [{ method: 'GET', path: '/shipments/new', expect: EDITOR_PAGE }],
		actions: [
			{ method: 'POST', path: '/shipments/new', form: { customerId: '' }, expect: EDITOR_ACTION }
		]
	},
	'/shipments/[shipmentId=uuid]': {
		page: [
			{ method: 'GET', path: '/shipments/:ship', expect: SIGNED_IN_200 },
			{ method: 'GET', path: '/shipments/:otherShip', expect: OTHER_SHIPMENT_PAGE }
		],
		actions: [
			{ method: 'POST', path: '/shipments/:ship?/status', form: { to: '' }, expect: EDITOR_ACTION },
			{ method: 'POST', path: '/shipments/:ship?/header', form: { x: '' }, expect: EDITOR_ACTION },
			// An empty line list with version 0 is well-formed but stale: the editors get 409.
			{
				method: 'POST',
				path: '/shipments/:ship?/lines',
				form: { x: '' },
				expect: { anonymous: 303, admin: 409, coordinator: 409, default: 403 }
			},
			{
				method: 'POST',
				path: '/shipments/:ship?/addContainer',
				form: { containerNumber: 'X' },
				expect: EDITOR_ACTION
			},
			{
				method: 'POST',
				path: '/shipments/:ship?/removeContainer',
				form: { containerId: 'x' },
				expect: EDITOR_ACTION
			},
			{
				method: 'POST',
				path: '/shipments/:ship?/addLot',
				form: { lotNumber: '' },
				expect: EDITOR_ACTION
			},
			{
				method: 'POST',
				path: '/shipments/:ship?/importLots',
				form: { lots: '' },
				expect: EDITOR_ACTION
			},
			{
				method: 'POST',
				path: '/shipments/:ship?/removeLot',
				form: { lotId: 'x' },
				expect: EDITOR_ACTION
			},
			// No version in the form: stale (409) for the editors, like the lines.
			{
				method: 'POST',
				path: '/shipments/:ship?/papers',
				form: { x: '' },
				expect: { anonymous: 303, admin: 409, coordinator: 409, default: 403 }
			},
			{
				method: 'POST',
				path: '/shipments/:ship?/issuePapers',
				form: { x: '' },
				expect: EDITOR_ACTION
			},
			// Deposits: finance and coordinators request and cancel, finance refunds, the customer pays.
			{
				method: 'POST',
				path: '/shipments/:ship?/requestDeposit',
				form: { basis: '' },
				expect: DEPOSIT_STAFF_ACTION
			},
			{
				method: 'POST',
				path: '/shipments/:ship?/cancelDeposit',
				form: { depositId: 'x' },
				expect: DEPOSIT_STAFF_ACTION
			},
			{
				method: 'POST',
				path: '/shipments/:ship?/refundDeposit',
				form: { depositId: 'x' },
				expect: { anonymous: 303, finance: 400, default: 403 }
			},
			{
				method: 'POST',
				path: '/shipments/:ship?/payDeposit',
				form: { depositId: 'x' },
				expect: { anonymous: 303, customer: 400, default: 403 }
			},
			...SUPPORTING_ACTIONS('/shipments/:ship')
		]
	},
	// No deposit has this id: invisible to everyone signed in.
	'/shipments/[shipmentId=uuid]/deposits/[depositId=uuid]/paid': {
		page: [
			{
				method: 'GET',
				path: '/shipments/:ship/deposits/00000000-0000-4000-8000-000000000000/paid',
				expect: { anonymous: 303, default: 404 }
			}
		]
	},
	'/shipments/[shipmentId=uuid]/deposits/[depositId=uuid]/receipt': {
		page: [
			{
				method: 'GET',
				path: '/shipments/:ship/deposits/00000000-0000-4000-8000-000000000000/receipt',
				expect: { anonymous: 303, default: 404 }
			}
		]
	},
	'/shipments/[shipmentId=uuid]/deposits/[depositId=uuid]/not-paid': {
		page: [
			{
				method: 'GET',
				path: '/shipments/:ship/deposits/00000000-0000-4000-8000-000000000000/not-paid',
				expect: { anonymous: 303, default: 404 }
			}
		]
	},
	'/shipments/[shipmentId=uuid]/landed-cost': {
		page: [
			{ method: 'GET', path: '/shipments/:ship/landed-cost', expect: STAFF_PAGE },
			{ method: 'GET', path: '/shipments/:otherShip/landed-cost', expect: STAFF_PAGE }
		],
		actions: [
			{
				method: 'POST',
				path: '/shipments/:ship/landed-cost?/saveScenario',
				form: { name: '' },
				expect: { anonymous: 303, broker: 403, customer: 403, default: 400 }
			}
		]
	},
	'/shipments/[shipmentId=uuid]/landed-cost/scenarios/[scenarioId=uuid]': {
		// No such scenario: staff get a 404; the others never reach the lookup.
		page: [
			{
				method: 'GET',
				path: '/shipments/:ship/landed-cost/scenarios/00000000-0000-4000-8000-000000000000',
				expect: { anonymous: 303, broker: 403, customer: 403, default: 404 }
			}
		]
	},
	'/shipments/[shipmentId=uuid]/papers/[documentId=uuid]': {
		api: [
			{
				method: 'GET',
				path: '/shipments/:cedar/papers/:cedarDoc',
				expect: OTHER_SHIPMENT_PAGE
			}
		]
	},
	'/shipments/[shipmentId=uuid]/papers/current.zip': {
		api: [
			{ method: 'GET', path: '/shipments/:cedar/papers/current.zip', expect: OTHER_SHIPMENT_PAGE }
		]
	},
	'/api/health': { api: [{ method: 'GET', path: '/api/health', expect: { default: 200 } }] },
	// The benchmarks' no-op: public, no database, no session, an empty 204.
	'/api/ping': { api: [{ method: 'GET', path: '/api/ping', expect: { default: 204 } }] },
	'/api/v1/me': { api: [{ method: 'GET', path: '/api/v1/me', expect: API_200 }] },
	'/api/v1/organizations': {
		api: [{ method: 'GET', path: '/api/v1/organizations', expect: API_200 }]
	},
	'/api/v1/organizations/[organizationId=uuid]': {
		api: [
			{ method: 'GET', path: '/api/v1/organizations/:own', expect: API_200 },
			{ method: 'GET', path: '/api/v1/organizations/:other', expect: OTHER_ORG_API }
		]
	},
	'/api/v1/users': {
		api: [
			{ method: 'GET', path: '/api/v1/users', expect: ADMIN_API },
			{
				method: 'POST',
				path: '/api/v1/users',
				body: {},
				expect: { anonymous: 401, admin: 400, default: 403 }
			}
		]
	},
	'/api/v1/users/[userId=uuid]': {
		api: [
			{ method: 'GET', path: '/api/v1/users/:user', expect: ADMIN_API },
			{
				method: 'PATCH',
				path: '/api/v1/users/:user',
				body: {},
				expect: { anonymous: 401, admin: 400, default: 403 }
			}
		]
	},
	'/api/v1/audit-events': {
		api: [
			{ method: 'GET', path: '/api/v1/audit-events', expect: ADMIN_API },
			{ method: 'GET', path: '/api/v1/audit-events?limit=5&offset=0', expect: ADMIN_API }
		]
	},
	'/api/v1/openapi.json': {
		api: [{ method: 'GET', path: '/api/v1/openapi.json', expect: API_200 }]
	},
	'/api/v1/calc/measure': {
		api: [
			{
				method: 'POST',
				path: '/api/v1/calc/measure',
				body: {},
				expect: { anonymous: 401, customer: 403, default: 400 }
			}
		]
	},
	'/api/v1/calc/landed-cost': {
		api: [
			{
				method: 'POST',
				path: '/api/v1/calc/landed-cost',
				body: {},
				expect: { anonymous: 401, broker: 403, customer: 403, default: 400 }
			}
		]
	},
	'/api/v1/calc/load-plan': {
		api: [
			{
				method: 'POST',
				path: '/api/v1/calc/load-plan',
				body: {},
				expect: { anonymous: 401, customer: 403, default: 400 }
			}
		]
	},
	'/api/v1/shipments': {
		api: [
			{ method: 'GET', path: '/api/v1/shipments', expect: API_200 },
			{ method: 'POST', path: '/api/v1/shipments', body: {}, expect: EDITOR_API }
		]
	},
	'/api/v1/shipments/[shipmentId=uuid]': {
		api: [
			{ method: 'GET', path: '/api/v1/shipments/:ship', expect: API_200 },
			{ method: 'GET', path: '/api/v1/shipments/:otherShip', expect: OTHER_SHIPMENT_API },
			{ method: 'PATCH', path: '/api/v1/shipments/:ship', body: {}, expect: EDITOR_API }
		]
	},
	'/api/v1/shipments/[shipmentId=uuid]/lines': {
		api: [{ method: 'PUT', path: '/api/v1/shipments/:ship/lines', body: {}, expect: EDITOR_API }]
	},
	'/api/v1/shipments/[shipmentId=uuid]/measure': {
		api: [
			{ method: 'GET', path: '/api/v1/shipments/:ship/measure', expect: API_200 },
			{ method: 'GET', path: '/api/v1/shipments/:otherShip/measure', expect: OTHER_SHIPMENT_API }
		]
	},
	'/api/v1/shipments/[shipmentId=uuid]/documents': {
		api: [
			{ method: 'GET', path: '/api/v1/shipments/:ship/documents', expect: API_200 },
			{ method: 'GET', path: '/api/v1/shipments/:otherShip/documents', expect: OTHER_SHIPMENT_API },
			{ method: 'POST', path: '/api/v1/shipments/:ship/documents', body: {}, expect: EDITOR_API }
		]
	},
	'/api/v1/shipments/[shipmentId=uuid]/documents/[documentId=uuid]': {
		api: [
			{
				method: 'GET',
				path: '/api/v1/shipments/:cedar/documents/:cedarDoc',
				expect: OTHER_SHIPMENT_API
			}
		]
	},
	'/api/v1/shipments/[shipmentId=uuid]/documents.zip': {
		api: [
			{ method: 'GET', path: '/api/v1/shipments/:cedar/documents.zip', expect: OTHER_SHIPMENT_API }
		]
	},
	'/api/v1/shipments/[shipmentId=uuid]/landed-cost': {
		api: [
			{
				method: 'GET',
				path: '/api/v1/shipments/:ship/landed-cost?mode=sea_lcl',
				expect: { anonymous: 401, broker: 403, customer: 403, default: 200 }
			},
			{
				method: 'GET',
				path: '/api/v1/shipments/:ship/landed-cost?mode=rocket',
				expect: { anonymous: 401, broker: 403, customer: 403, default: 400 }
			}
		]
	},
	'/api/v1/shipments/[shipmentId=uuid]/supporting-documents': {
		api: [
			{ method: 'GET', path: '/api/v1/shipments/:ship/supporting-documents', expect: API_200 },
			{
				method: 'GET',
				path: '/api/v1/shipments/:otherShip/supporting-documents',
				expect: OTHER_SHIPMENT_API
			}
		]
	},
	'/api/v1/shipments/[shipmentId=uuid]/supporting-documents/[documentId=uuid]': {
		api: [
			{
				method: 'GET',
				path: '/api/v1/shipments/:ship/supporting-documents/00000000-0000-4000-8000-000000000000',
				expect: { anonymous: 401, default: 404 }
			},
			{
				method: 'GET',
				path: '/api/v1/shipments/:cedar/supporting-documents/:cedarSupport',
				expect: OTHER_SHIPMENT_API
			}
		]
	},
	'/api/v1/shipments/[shipmentId=uuid]/deposits': {
		api: [
			{
				method: 'GET',
				path: '/api/v1/shipments/:ship/deposits',
				expect: { anonymous: 401, broker: 403, default: 200 }
			},
			{
				method: 'GET',
				path: '/api/v1/shipments/:otherShip/deposits',
				expect: { anonymous: 401, broker: 403, customer: 404, default: 200 }
			}
		]
	},
	// No session needed: an unsigned body is refused the same for everyone and changes nothing.
	'/api/v1/stripe/webhook': {
		api: [{ method: 'POST', path: '/api/v1/stripe/webhook', body: {}, expect: { default: 400 } }]
	},
	'/api/v1/shipments/[shipmentId=uuid]/load-plan': {
		api: [
			{ method: 'GET', path: '/api/v1/shipments/:ship/load-plan', expect: API_200 },
			{ method: 'GET', path: '/api/v1/shipments/:otherShip/load-plan', expect: OTHER_SHIPMENT_API }
		]
	}
};

export interface FoundRoute {
	id: string;
	page: boolean;
	actions: boolean;
	methods: string[];
}

export function findRoutes(dir = 'src/routes', prefix = ''): FoundRoute[] {
	const entries = readdirSync(dir, { withFileTypes: true });
	const files = entries.filter((e) => e.isFile()).map((e) => e.name);
	const found: FoundRoute[] = [];
	const server = files.includes('+page.server.ts')
		? readFileSync(path.join(dir, '+page.server.ts'), 'utf8')
		: '';
	const endpoint = files.includes('+server.ts')
		? readFileSync(path.join(dir, '+server.ts'), 'utf8')
		: '';
	if (files.includes('+page.svelte') || endpoint) {
		found.push({
			id: prefix || '/',
			page: files.includes('+page.svelte'),
			actions: /export const actions/.test(server),
			methods: [...endpoint.matchAll(/export const (GET|POST|PUT|PATCH|DELETE)\b/g)].map(
				(m) => m[1]!
			)
		});
	}
	for (const entry of entries.filter((e) => e.isDirectory())) {
		const segment = /^\(.+\)$/.test(entry.name) ? '' : `/${entry.name}`;
		found.push(...findRoutes(path.join(dir, entry.name), prefix + segment));
	}
	return found;
}

/** Every probe with its route id, in table order. */
export function allProbes(): (Probe & { id: string })[] {
	return Object.entries(ROUTES).flatMap(([id, entry]) =>
		[...(entry.page ?? []), ...(entry.actions ?? []), ...(entry.api ?? [])].map((p) => ({
			id,
			...p
		}))
	);
}

/** What the placeholders of Probe.path stand for (own: each user's organization). */
export interface ProbeIds {
	own: Map<Who, string>;
	other: string;
	user: string;
	product: string;
	place: string;
	party: string;
	pallet: string;
	container: string;
	tariff: string;
	rateCard: string;
	countryRule: string;
	fee: string;
	deMinimis: string;
	ship: string;
	otherShip: string;
	cedar: string;
	cedarDoc: string;
	cedarSupport: string;
}

/** Looks the placeholder ids up through the admin's and the broker's sessions. */
export async function resolveIds(
	admin: APIRequestContext,
	broker: APIRequestContext
): Promise<ProbeIds> {
	const ids: ProbeIds = {
		own: new Map<Who, string>(),
		other: '',
		user: '',
		product: '',
		place: '',
		party: '',
		pallet: '',
		container: '',
		tariff: '',
		rateCard: '',
		countryRule: '',
		fee: '',
		deMinimis: '',
		ship: '',
		otherShip: '',
		cedar: '',
		cedarDoc: '',
		cedarSupport: ''
	};
	const { organizations } = (await (await admin.get('/api/v1/organizations')).json()) as {
		organizations: { id: string; name: string }[];
	};
	const { users } = (await (await admin.get('/api/v1/users')).json()) as {
		users: { id: string; email: string; organizationId: string }[];
	};
	for (const who of WHO) {
		if (who === 'anonymous') continue;
		ids.own.set(who, users.find((u) => u.email === DEMO[who])!.organizationId);
	}
	ids.own.set('anonymous', ids.own.get('customer')!);
	// The other customer's organization: Wattlebird, never Hallvik's own.
	ids.other = users.find((u) => u.email === DEMO.otherCustomer)!.organizationId;
	ids.user = users.find((u) => u.email === DEMO.coordinator)!.id;
	expect(organizations.length).toBeGreaterThan(3);
	// Oldest first: the seeded ones (Hallvik's has broker Kaaiman), not drafts that other
	// specs running alongside create for Hallvik.
	const list = await admin.get('/api/v1/shipments?pageSize=200&sort=created&dir=asc');
	const { rows } = (await list.json()) as {
		rows: { id: string; customerName: string }[];
	};
	// Hallvik's shipment that broker Kaaiman is assigned to (asked as the broker: other tests may
	// be creating Hallvik shipments without a broker meanwhile).
	const brokerList = (await (await broker.get('/api/v1/shipments?pageSize=200')).json()) as {
		rows: { id: string; customerName: string }[];
	};
	ids.ship = brokerList.rows.find((r) => r.customerName.startsWith('Hallvik'))!.id;
	ids.otherShip = rows.find((r) => r.customerName.startsWith('Wattlebird'))!.id;
	// Cedarpoint's seeded shipment has its papers issued and no broker.
	ids.cedar = rows.find((r) => r.customerName.startsWith('Cedarpoint'))!.id;
	const register = (await (await admin.get(`/api/v1/shipments/${ids.cedar}/documents`)).json()) as {
		papers: { id: string }[];
	};
	ids.cedarDoc = register.papers[0]!.id;
	// Its seeded certificate of origin (seeders/demo-supporting-documents.ts).
	const supporting = (await (
		await admin.get(`/api/v1/shipments/${ids.cedar}/supporting-documents`)
	).json()) as { documents: { id: string }[] };
	ids.cedarSupport = supporting.documents[0]!.id;
	const productsPage = await admin.get('/products');
	ids.product = /\/products\/([0-9a-f-]{36})/.exec(await productsPage.text())![1]!;
	const firstId = async (page: string, link: string) =>
		new RegExp(`${link}/([0-9a-f-]{36})`).exec(await (await admin.get(page)).text())![1]!;
	ids.place = await firstId('/places', '/places');
	ids.party = await firstId('/parties', '/parties');
	ids.pallet = await firstId('/equipment', '/equipment/pallet-types');
	ids.container = await firstId('/equipment', '/equipment/container-types');
	ids.tariff = await firstId('/reference/tariffs', '/reference/tariffs');
	ids.rateCard = await firstId('/reference/rate-cards', '/reference/rate-cards');
	ids.countryRule = await firstId('/reference/country-rules', '/reference/country-rules');
	ids.fee = await firstId('/reference/country-rules', '/reference/country-rules/fees');
	ids.deMinimis = await firstId('/reference/country-rules', '/reference/country-rules/de-minimis');
	return ids;
}

/** The probe's path with its placeholders replaced, as `who` would ask it. */
export function fillPath(path: string, ids: ProbeIds, who: Who): string {
	return path
		.replace(':otherShip', ids.otherShip)
		.replace(':cedarSupport', ids.cedarSupport)
		.replace(':cedarDoc', ids.cedarDoc)
		.replace(':cedar', ids.cedar)
		.replace(':ship', ids.ship)
		.replace(':own', ids.own.get(who)!)
		.replace(':other', ids.other)
		.replace(':user', ids.user)
		.replace(':product', ids.product)
		.replace(':place', ids.place)
		.replace(':party', ids.party)
		.replace(':pallet', ids.pallet)
		.replace(':container', ids.container)
		.replace(':tariff', ids.tariff)
		.replace(':rateCard', ids.rateCard)
		.replace(':countryRule', ids.countryRule)
		.replace(':fee', ids.fee)
		.replace(':deMinimis', ids.deMinimis);
}
