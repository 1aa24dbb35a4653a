/**
 * Supporting documents of a shipment or a product (migration 018): upload, list, download,
 * retire, and what the readiness check asks of them.
 *
 * Who sees what, in the query itself:
 * - a shipment's documents: whoever sees the shipment (staff; the customer; the assigned broker);
 * - a product's documents: staff, and a broker for products on a shipment assigned to its firm
 *   (it may have to show a UN38.3 summary or an origin proof to customs). Customers do not:
 *   supplier declarations name the manufacturer's suppliers.
 * Coordinators and administrators upload and retire (finance and brokers do not: a broker sends a
 * certificate of origin to the coordinator, who files it, so the exporter answers for what is on
 * file). Anything not visible is a 404, so an id never confirms that a document exists.
 * Expiry reminders are in supporting-document-expiry.ts.
 */
import { createHash } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { checkUpload } from '../../uploads/file-check';
import { SUPPORTING_KIND_INFO, type SupportingKind } from '../../uploads/document-kinds';
import { isStaff } from '../../roles';
import type { SessionUser } from '../auth/session-user';
import { Shipment } from '../db/models';
import { recordAudit } from './audit';
import { invalid, refused, type ServiceResult } from './result';
import { canEditShipments, shipmentScopeSql } from './shipment-scope';

// The models' connection, not db(): the seeders issue papers (and so read this) outside SvelteKit.
const db = () => Shipment.sequelize!;

export type DocumentOwner = { shipmentId: string } | { productId: string };

export interface SupportingDocumentRow {
	id: string;
	kind: SupportingKind;
	kindLabel: string;
	title: string;
	fileName: string;
	contentType: string;
	sizeBytes: number;
	sha256: string;
	issuedOn: string | null;
	expiresOn: string | null;
	/** Not retired and not past its expiry date today. */
	current: boolean;
	uploadedBy: string | null;
	uploadedAt: string;
	retiredAt: string | null;
	downloads: number;
}

export interface UploadInput {
	kind: SupportingKind;
	title: string;
	issuedOn: string | null;
	expiresOn: string | null;
	fileName: string;
	bytes: Uint8Array;
}

/** SQL (alias d) that limits supporting documents to those `user` may see. */
function visibleSql(user: SessionUser): { sql: string; replacements: Record<string, string> } {
	const scope = shipmentScopeSql(user);
	const onShipment = `d.shipment_id IN (SELECT s.id FROM shipments s WHERE ${scope.sql})`;
	if (isStaff(user.role)) return { sql: 'TRUE', replacements: {} };
	if (user.role === 'broker')
		return {
			sql: `(${onShipment} OR d.product_id IN (
				SELECT l.product_id FROM shipment_lines l
				JOIN shipments s ON s.id = l.shipment_id
				WHERE ${scope.sql}))`,
			replacements: scope.replacements
		};
	return { sql: onShipment, replacements: scope.replacements };
}

const SELECT = `
	SELECT d.id, d.kind, d.title, d.file_name AS "fileName", d.content_type AS "contentType",
	       d.size_bytes AS "sizeBytes", d.sha256, d.issued_on::text AS "issuedOn",
	       d.expires_on::text AS "expiresOn",
	       (d.retired_at IS NULL AND (d.expires_on IS NULL OR d.expires_on >= current_date)) AS current,
	       u.name AS "uploadedBy", d.created_at AS "uploadedAt", d.retired_at AS "retiredAt",
	       (SELECT count(*)::int FROM supporting_document_downloads x WHERE x.document_id = d.id) AS downloads
	FROM supporting_documents d LEFT JOIN users u ON u.id = d.uploaded_by`;

type RawRow = Omit<SupportingDocumentRow, 'kindLabel' | 'uploadedAt' | 'retiredAt'> & {
	uploadedAt: Date;
	retiredAt: Date | null;
};

function toRow(r: RawRow): SupportingDocumentRow {
	return {
		...r,
		kindLabel: SUPPORTING_KIND_INFO[r.kind].label,
		uploadedAt: r.uploadedAt.toISOString(),
		retiredAt: r.retiredAt ? r.retiredAt.toISOString() : null
	};
}

function ownerSql(owner: DocumentOwner) {
	return 'shipmentId' in owner
		? { sql: 'd.shipment_id = :ownerId', ownerId: owner.shipmentId }
		: { sql: 'd.product_id = :ownerId', ownerId: owner.productId };
}

/**
 * The documents of a shipment or product that `user` may see, current ones first; null when
 * the owner itself is not visible to `user` (a 404, not an empty list).
 */
export async function listSupportingDocuments(
	user: SessionUser,
	owner: DocumentOwner
): Promise<SupportingDocumentRow[] | null> {
	if (!(await ownerVisible(user, owner))) return null;
	const scope = visibleSql(user);
	const o = ownerSql(owner);
	const rows = await db().query<RawRow>(
		`${SELECT} WHERE ${o.sql} AND ${scope.sql}
		 ORDER BY (d.retired_at IS NULL) DESC, d.kind, d.created_at DESC`,
		{ replacements: { ...scope.replacements, ownerId: o.ownerId }, type: QueryTypes.SELECT }
	);
	return rows.map(toRow);
}

async function ownerVisible(user: SessionUser, owner: DocumentOwner): Promise<boolean> {
	const scope = shipmentScopeSql(user);
	if ('productId' in owner) {
		if (user.role === 'customer') return false;
		const onShipments =
			user.role === 'broker'
				? `AND id IN (SELECT l.product_id FROM shipment_lines l JOIN shipments s ON s.id = l.shipment_id WHERE ${scope.sql})`
				: '';
		const [row] = await db().query(`SELECT 1 FROM products WHERE id = :id ${onShipments}`, {
			replacements: { ...scope.replacements, id: owner.productId },
			type: QueryTypes.SELECT
		});
		return Boolean(row);
	}
	const [row] = await db().query(`SELECT 1 FROM shipments s WHERE s.id = :id AND ${scope.sql}`, {
		replacements: { ...scope.replacements, id: owner.shipmentId },
		type: QueryTypes.SELECT
	});
	return Boolean(row);
}

/** Stores an upload after checking its content; field errors name `file` or the dates. */
export async function uploadSupportingDocument(
	user: SessionUser,
	owner: DocumentOwner,
	input: UploadInput,
	ip: string | null
): Promise<ServiceResult<{ id: string; fileName: string; sha256: string }>> {
	if (!canEditShipments(user))
		return refused(403, 'Only coordinators and administrators add supporting documents.');
	const check = checkUpload({ name: input.fileName, bytes: input.bytes });
	if (!check.ok)
		return invalid({ file: check.message }, 'The file was not added: see the file field.');
	if (input.issuedOn && input.expiresOn && input.expiresOn < input.issuedOn)
		return invalid({ expiresOn: 'The expiry date is before the date of issue.' });
	if (!(await ownerVisible(user, owner)))
		return refused(404, 'No such shipment or product is visible to you.');
	const sha256 = createHash('sha256').update(input.bytes).digest('hex');
	const id = await db().transaction(async (transaction) => {
		const [row] = await db().query<{ id: string }>(
			`INSERT INTO supporting_documents (shipment_id, product_id, kind, title, file_name, content_type,
			        size_bytes, sha256, content, issued_on, expires_on, uploaded_by)
			 VALUES (:shipmentId, :productId, :kind, :title, :fileName, :type, :size, :sha256, :content,
			        :issuedOn, :expiresOn, :userId)
			 RETURNING id`,
			{
				replacements: {
					shipmentId: 'shipmentId' in owner ? owner.shipmentId : null,
					productId: 'productId' in owner ? owner.productId : null,
					kind: input.kind,
					title: input.title,
					fileName: check.fileName,
					type: check.type,
					size: check.size,
					sha256,
					content: Buffer.from(input.bytes),
					issuedOn: input.issuedOn,
					expiresOn: input.expiresOn,
					userId: user.id
				},
				transaction,
				type: QueryTypes.SELECT
			}
		);
		await recordAudit(
			{
				actorUserId: user.id,
				action: 'supporting_document.upload',
				entity: 'supporting_document',
				entityId: row!.id,
				after: { ...owner, kind: input.kind, title: input.title, fileName: check.fileName, sha256 },
				ip
			},
			transaction
		);
		return row!.id;
	});
	return { ok: true, value: { id, fileName: check.fileName, sha256 } };
}

export interface SupportingFile {
	fileName: string;
	contentType: string;
	sha256: string;
	content: Buffer;
}

/** The file, if `user` may see it under `owner`; the download is logged in the same step. */
export async function downloadSupportingDocument(
	user: SessionUser,
	owner: DocumentOwner,
	documentId: string,
	via: 'file' | 'api',
	ip: string | null = null
): Promise<SupportingFile | null> {
	const scope = visibleSql(user);
	const o = ownerSql(owner);
	return db().transaction(async (transaction) => {
		const [row] = await db().query<SupportingFile>(
			`SELECT d.file_name AS "fileName", d.content_type AS "contentType", d.sha256, d.content
			 FROM supporting_documents d WHERE d.id = :documentId AND ${o.sql} AND ${scope.sql}`,
			{
				replacements: { ...scope.replacements, ownerId: o.ownerId, documentId },
				transaction,
				type: QueryTypes.SELECT
			}
		);
		if (!row) return null;
		await db().query(
			`INSERT INTO supporting_document_downloads (document_id, user_id, via, ip)
			 VALUES (:documentId, :userId, :via, :ip)`,
			{ replacements: { documentId, userId: user.id, via, ip }, transaction }
		);
		return row;
	});
}

/** Retires a document: it stays on record but no longer counts for the readiness check. */
export async function retireSupportingDocument(
	user: SessionUser,
	owner: DocumentOwner,
	documentId: string,
	ip: string | null
): Promise<ServiceResult<{ id: string }>> {
	if (!canEditShipments(user))
		return refused(403, 'Only coordinators and administrators retire supporting documents.');
	const o = ownerSql(owner);
	return db().transaction(async (transaction) => {
		const [row] = await db().query<{ id: string }>(
			`UPDATE supporting_documents d SET retired_at = now(), retired_by = :userId
			 WHERE d.id = :documentId AND ${o.sql} AND d.retired_at IS NULL RETURNING d.id`,
			{
				replacements: { userId: user.id, documentId, ownerId: o.ownerId },
				transaction,
				type: QueryTypes.SELECT
			}
		);
		if (!row) return refused(404, 'No such current document.');
		await recordAudit(
			{
				actorUserId: user.id,
				action: 'supporting_document.retire',
				entity: 'supporting_document',
				entityId: documentId,
				ip
			},
			transaction
		);
		return { ok: true as const, value: { id: row.id } };
	});
}

/** A document that counts on a date: not retired, and no expiry or one on or after the date. */
export interface CurrentDocument {
	id: string;
	/** Exactly one of the two is set, as in the table. */
	productId: string | null;
	shipmentId: string | null;
	title: string;
	issuedOn: string | null;
	expiresOn: string | null;
}

/**
 * For the readiness checklist: the current documents of `kind` on `onDate` (YYYY-MM-DD) that are
 * filed on any of `productIds`, or on `options.shipmentId` when given (a shipment-level UN38.3
 * summary or proof of origin counts too). Latest expiry first. Not scoped to a user: it answers
 * "is it on file", for staff who issue papers; never return the rows to a customer as they are.
 */
export async function currentDocumentsOfKind(
	productIds: readonly string[],
	kind: SupportingKind,
	onDate: string,
	options: { shipmentId?: string } = {}
): Promise<CurrentDocument[]> {
	if (productIds.length === 0 && !options.shipmentId) return [];
	return db().query<CurrentDocument>(
		`SELECT id, product_id AS "productId", shipment_id AS "shipmentId", title,
		        issued_on::text AS "issuedOn", expires_on::text AS "expiresOn"
		   FROM supporting_documents
		  WHERE kind = :kind AND retired_at IS NULL AND (expires_on IS NULL OR expires_on >= :onDate)
		    AND (product_id = ANY(CAST(:productIds AS uuid[])) OR shipment_id = :shipmentId)
		  ORDER BY expires_on DESC NULLS FIRST, created_at DESC`,
		{
			replacements: {
				kind,
				onDate,
				productIds: `{${productIds.join(',')}}`,
				shipmentId: options.shipmentId ?? null
			},
			type: QueryTypes.SELECT
		}
	);
}
