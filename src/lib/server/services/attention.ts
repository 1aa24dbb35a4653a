import { QueryTypes } from 'sequelize';
import type { SessionUser } from '../auth/session-user';
import { Shipment } from '../db/models';
import { shipmentScopeSql } from './shipment-scope';

export interface AttentionShipment {
	id: string;
	reference: string;
	status: Shipment['status'];
	customerName: string;
	etd: string | null;
	/** What a draft still lacks before it can be booked. */
	missing: string[];
}

const BASE = `SELECT s.id, s.reference, s.status, c.name AS "customerName", s.etd,
		(SELECT count(*)::int FROM shipment_lines l WHERE l.shipment_id = s.id) AS "lineCount",
		s.chosen_mode AS "chosenMode", s.consignee_id AS "consigneeId"
	FROM shipments s JOIN organizations c ON c.id = s.customer_id`;

type Row = AttentionShipment & {
	lineCount: number;
	chosenMode: string | null;
	consigneeId: string | null;
};

function missingOf(row: Row): string[] {
	return [
		row.lineCount === 0 && 'lines',
		!row.chosenMode && 'chosen mode',
		!row.etd && 'departure date',
		!row.consigneeId && 'consignee'
	].filter((x): x is string => typeof x === 'string');
}

/** What needs the user's attention on the overview, per role, scoped like every shipment query. */
export async function attentionFor(user: SessionUser) {
	const sequelize = Shipment.sequelize!;
	const scope = shipmentScopeSql(user);
	const run = async (where: string, order: string, extra: Record<string, unknown> = {}) =>
		(
			await sequelize.query<Row>(
				`${BASE} WHERE ${scope.sql} AND ${where} ORDER BY ${order} LIMIT 20`,
				{
					type: QueryTypes.SELECT,
					replacements: { ...scope.replacements, ...extra }
				}
			)
		).map((row) => ({
			id: row.id,
			reference: row.reference,
			status: row.status,
			customerName: row.customerName,
			etd: row.etd,
			missing: missingOf(row)
		}));
	const open = "s.status NOT IN ('delivered', 'cancelled')";
	if (user.role === 'broker' || user.role === 'customer') {
		return { departing: [], drafts: [], open: await run(open, 's.etd ASC NULLS LAST') };
	}
	const departing = await run(
		`${open} AND s.etd BETWEEN current_date AND current_date + 14`,
		's.etd ASC'
	);
	const drafts = (await run("s.status = 'draft'", 's.created_at DESC')).filter(
		(s) => s.missing.length
	);
	return { departing, drafts, open: [] };
}
