import { QueryTypes } from 'sequelize';
import { DOCUMENT_TITLES, type DocumentKind } from '../../documents/types';
import type { SessionUser } from '../auth/session-user';
import { Shipment } from '../db/models';
import { shipmentScopeSql } from './shipment-scope';

export interface RecentPaper {
	id: string;
	shipmentId: string;
	reference: string;
	kind: DocumentKind;
	title: string;
	number: string;
	revision: string;
	issuedAt: string;
}

/** The latest current papers of the shipments the user may see (scoped in the query), newest first. */
export async function recentPapers(user: SessionUser, limit = 8): Promise<RecentPaper[]> {
	const scope = shipmentScopeSql(user);
	const rows = await Shipment.sequelize!.query<
		Omit<RecentPaper, 'title' | 'issuedAt'> & {
			issuedAt: Date;
		}
	>(
		`SELECT d.id, d.shipment_id AS "shipmentId", s.reference, d.kind, d.number, d.revision,
		        d.issued_at AS "issuedAt"
		   FROM shipment_documents d JOIN shipments s ON s.id = d.shipment_id
		  WHERE d.superseded_at IS NULL AND ${scope.sql}
		  ORDER BY d.issued_at DESC, d.kind
		  LIMIT :limit`,
		{ replacements: { ...scope.replacements, limit }, type: QueryTypes.SELECT }
	);
	return rows.map((r) => ({
		...r,
		title: DOCUMENT_TITLES[r.kind],
		issuedAt: r.issuedAt.toISOString()
	}));
}
