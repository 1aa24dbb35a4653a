// Roles, organization kinds and the navigation each role sees. Shared by server and pages;
// holds no secrets and no data access.

export const ROLES = ['admin', 'coordinator', 'broker', 'finance', 'customer'] as const;
export type Role = (typeof ROLES)[number];

export const ORGANIZATION_KINDS = ['exporter', 'customer', 'broker', 'forwarder'] as const;
export type OrganizationKind = (typeof ORGANIZATION_KINDS)[number];

/** Roles of the exporter's own staff: they see every organization's rows. */
export const STAFF_ROLES = ['admin', 'coordinator', 'finance'] as const satisfies readonly Role[];

export const ROLE_LABELS: Record<Role, string> = {
	admin: 'Administrator',
	coordinator: 'Logistics coordinator',
	broker: 'Customs broker',
	finance: 'Finance',
	customer: 'Customer'
};

export const ORGANIZATION_KIND_LABELS: Record<OrganizationKind, string> = {
	exporter: 'Exporter',
	customer: 'Customer',
	broker: 'Customs broker',
	forwarder: 'Forwarder'
};

/** The kind of organization a user of each role must belong to. */
export const ROLE_ORGANIZATION_KIND: Record<Role, OrganizationKind> = {
	admin: 'exporter',
	coordinator: 'exporter',
	finance: 'exporter',
	broker: 'broker',
	customer: 'customer'
};

export function isRole(value: unknown): value is Role {
	return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

export function isStaff(role: Role): boolean {
	return (STAFF_ROLES as readonly Role[]).includes(role);
}

/** Who adds and changes master data: places, parties, products, pallet and container types. */
export function canEditMasterData(role: Role): boolean {
	return role === 'admin' || role === 'coordinator';
}

/** Who changes the landed-cost reference data (rates, tariffs, settings); coordinators read it. */
export function canEditReferenceData(role: Role): boolean {
	return role === 'admin' || role === 'finance';
}

export const REFERENCE_DATA_READERS = [
	'admin',
	'finance',
	'coordinator'
] as const satisfies readonly Role[];
export const REFERENCE_DATA_EDITORS = ['admin', 'finance'] as const satisfies readonly Role[];

export interface NavItem {
	href: string;
	label: string;
}

/** The navigation a role sees; later features add their entries here. */
export function navigationFor(role: Role, organizationId: string): NavItem[] {
	const overview = { href: '/', label: 'Overview' };
	const shipments = { href: '/shipments', label: 'Shipments' };
	const products = { href: '/products', label: 'Products' };
	const trace = { href: '/trace', label: 'Trace a serial' };
	const equipment = { href: '/equipment', label: 'Pallets & containers' };
	const places = { href: '/places', label: 'Places & parties' };
	const referenceData = { href: '/reference/exchange-rates', label: 'Landed-cost data' };
	switch (role) {
		case 'admin':
			return [
				overview,
				shipments,
				products,
				places,
				equipment,
				referenceData,
				trace,
				{ href: '/organizations', label: 'Organizations' },
				{ href: '/admin/users', label: 'People & access' },
				{ href: '/admin/audit', label: 'Audit trail' },
				{ href: '/admin/mail', label: 'Outgoing mail' }
			];
		case 'coordinator':
			return [
				overview,
				shipments,
				products,
				places,
				equipment,
				trace,
				{ href: '/organizations', label: 'Organizations' }
			];
		case 'finance':
			return [
				overview,
				shipments,
				products,
				referenceData,
				trace,
				{ href: '/organizations', label: 'Organizations' }
			];
		case 'broker':
			return [
				overview,
				shipments,
				products,
				{ href: `/organizations/${organizationId}`, label: 'Our firm' }
			];
		case 'customer':
			return [
				overview,
				shipments,
				{ href: `/organizations/${organizationId}`, label: 'Our company' }
			];
	}
}
