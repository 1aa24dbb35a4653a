/**
 * The document register of a shipment: every issued paper and revision, who may download which,
 * and the download log. Scoped in SQL like the shipment (staff all, a customer its own, a broker
 * the shipments assigned to its firm).
 */
import { QueryTypes } from 'sequelize';
import { isStaff } from '../../../roles';
import { complianceAdvice, type ComplianceItem } from '../../../documents/compliance-readiness';
import { readiness, type ReadinessItem } from '../../../documents/readiness';
import { DOCUMENT_KINDS, DOCUMENT_TITLES, type DocumentKind } from '../../../documents/types';
import type { SessionUser } from '../../auth/session-user';
import { Shipment } from '../../db/models';
import { canEditShipments, shipmentScopeSql } from '../shipment-scope';
import { documentSource } from './document-source';
import { freshContentHash } from './issue';

export interface RegisterEntry {
	id: string;
	kind: DocumentKind;
	title: string;
	number: string;
	revision: string;
	reason: string | null;
	issuedAt: string;
	issuedBy: string | null;
	current: boolean;
	supersededAt: string | null;
	sha256: string;
	pages: number;
	byteSize: number;
	/** For current papers, seen by staff: false when the shipment changed since the issue. */
	upToDate: boolean | null;
	/** Staff only: how often it was downloaded, and the last time. */
	downloads: number | null;
	lastDownloadAt: string | null;
	fileName: string;
}

export interface DocumentRegister {
	shipmentId: string;
	reference: string;
	status: string;
	papers: RegisterEntry[];
	/** Staff who may issue: what blocks issuing now (empty = ready). */
	readiness: ReadinessItem[] | null;
	/** Staff who may issue: worth checking, but not blocking. */
	advice: ComplianceItem[] | null;
	canIssue: boolean;
}

export function fileName(number: string, revision: string): string {
	return `${number}-${revision}.pdf`;
}

async function visibleShipment(user: SessionUser, shipmentId: string) {
	const scope = shipmentScopeSql(user);
	const [row] = await Shipment.sequelize!.query<{ id: string; reference: string; status: string }>(
		`SELECT s.id, s.reference, s.status FROM shipments s WHERE s.id = :shipmentId AND ${scope.sql}`,
		{ replacements: { shipmentId, ...scope.replacements }, type: QueryTypes.SELECT }
	);
	return row ?? null;
}

interface Row {
	id: string;
	kind: DocumentKind;
	number: string;
	revision: string;
	reason: string | null;
	issued_at: Date;
	issued_by: string | null;
	superseded_at: Date | null;
	sha256: string;
	pages: number;
	byte_size: number;
	content_hash: string;
	downloads: string;
	last_download_at: Date | null;
}

export async function documentRegister(
	user: SessionUser,
	shipmentId: string
): Promise<DocumentRegister | null> {
	const shipment = await visibleShipment(user, shipmentId);
	if (!shipment) return null;
	const staff = isStaff(user.role);
	const rows = await Shipment.sequelize!.query<Row>(
		`SELECT d.id, d.kind, d.number, d.revision, d.reason, d.issued_at, u.name AS issued_by, d.superseded_at,
		        d.sha256, d.pages, d.byte_size, d.content_hash,
		        (SELECT count(*) FROM document_downloads x WHERE x.document_id = d.id) AS downloads,
		        (SELECT max(x.downloaded_at) FROM document_downloads x WHERE x.document_id = d.id) AS last_download_at
		   FROM shipment_documents d LEFT JOIN users u ON u.id = d.issued_by
		  WHERE d.shipment_id = :shipmentId
		  ORDER BY array_position(ARRAY['commercial_invoice', 'packing_list'], d.kind), d.revision_index DESC`,
		{ replacements: { shipmentId }, type: QueryTypes.SELECT }
	);
	const editor = canEditShipments(user);
	const gathered = editor ? await documentSource(user, shipmentId) : null;
	const items = gathered ? readiness(gathered.source) : null;
	const fresh = new Map<DocumentKind, string>();
	if (gathered && items?.length === 0)
		for (const kind of DOCUMENT_KINDS) fresh.set(kind, freshContentHash(kind, gathered.source));
	return {
		shipmentId,
		reference: shipment.reference,
		status: shipment.status,
		papers: rows.map((r) => ({
			id: r.id,
			kind: r.kind,
			title: DOCUMENT_TITLES[r.kind],
			number: r.number,
			revision: r.revision,
			reason: r.reason,
			issuedAt: r.issued_at.toISOString(),
			issuedBy: staff ? r.issued_by : null,
			current: r.superseded_at === null,
			supersededAt: r.superseded_at?.toISOString() ?? null,
			sha256: r.sha256,
			pages: r.pages,
			byteSize: r.byte_size,
			upToDate:
				editor && r.superseded_at === null
					? fresh.has(r.kind)
						? fresh.get(r.kind) === r.content_hash
						: false
					: null,
			downloads: staff ? Number(r.downloads) : null,
			lastDownloadAt: staff ? (r.last_download_at?.toISOString() ?? null) : null,
			fileName: fileName(r.number, r.revision)
		})),
		readiness: items,
		advice: gathered ? complianceAdvice(gathered.source) : null,
		canIssue: editor
	};
}

export interface PaperFile {
	id: string;
	number: string;
	revision: string;
	kind: DocumentKind;
	current: boolean;
	fileName: string;
	sha256: string;
	pdf: Buffer;
}

/**
 * The PDFs of one shipment visible to `user` (one paper, or all current ones), logged as
 * downloaded by `via`. Null when the shipment or paper is not visible.
 */
export async function downloadPapers(
	user: SessionUser,
	shipmentId: string,
	which: { documentId: string } | 'current',
	via: 'file' | 'zip' | 'api'
): Promise<{ reference: string; files: PaperFile[] } | null> {
	const shipment = await visibleShipment(user, shipmentId);
	if (!shipment) return null;
	const one = which !== 'current';
	const rows = await Shipment.sequelize!.query<{
		id: string;
		number: string;
		revision: string;
		kind: DocumentKind;
		superseded_at: Date | null;
		sha256: string;
		pdf: Buffer;
	}>(
		`SELECT d.id, d.number, d.revision, d.kind, d.superseded_at, d.sha256, d.pdf
		   FROM shipment_documents d
		  WHERE d.shipment_id = :shipmentId
		    AND ${one ? 'd.id = :documentId' : 'd.superseded_at IS NULL'}
		  ORDER BY d.kind`,
		{
			replacements: { shipmentId, documentId: one ? which.documentId : null },
			type: QueryTypes.SELECT
		}
	);
	if (one && rows.length === 0) return null;
	if (rows.length > 0) {
		await Shipment.sequelize!.query(
			`INSERT INTO document_downloads (document_id, user_id, via)
			 SELECT unnest(ARRAY[:ids]::uuid[]), :userId, :via`,
			{ replacements: { ids: rows.map((r) => r.id), userId: user.id, via } }
		);
	}
	return {
		reference: shipment.reference,
		files: rows.map((r) => ({
			id: r.id,
			number: r.number,
			revision: r.revision,
			kind: r.kind,
			current: r.superseded_at === null,
			fileName: fileName(r.number, r.revision),
			sha256: r.sha256,
			pdf: r.pdf
		}))
	};
}
