import type { SessionUser } from '../auth/session-user';

/**
 * Which shipments a user may see, as SQL on the alias `s`: staff all, a customer its own,
 * a broker those assigned to its firm. Put it in every query on shipments.
 */
export function shipmentScopeSql(user: SessionUser): {
	sql: string;
	replacements: Record<string, string>;
} {
	switch (user.role) {
		case 'customer':
			return { sql: 's.customer_id = :scopeOrg', replacements: { scopeOrg: user.organizationId } };
		case 'broker':
			return { sql: 's.broker_id = :scopeOrg', replacements: { scopeOrg: user.organizationId } };
		default:
			return { sql: 'TRUE', replacements: {} };
	}
}

/** The same scope as a Sequelize where-object for the Shipment model. */
export function shipmentScopeWhere(user: SessionUser): Record<string, string> {
	if (user.role === 'customer') return { customerId: user.organizationId };
	if (user.role === 'broker') return { brokerId: user.organizationId };
	return {};
}

export function canEditShipments(user: SessionUser): boolean {
	return user.role === 'admin' || user.role === 'coordinator';
}
