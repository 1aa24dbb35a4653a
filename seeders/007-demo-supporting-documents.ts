import PDFDocument from 'pdfkit';
import type { Sequelize } from 'sequelize';
import { loadSessionUser } from '../src/lib/server/auth/session-user';
import { Product, Shipment, User } from '../src/lib/server/db/models';
import { uploadSupportingDocument } from '../src/lib/server/services/supporting-documents';
import {
	DEMO_SUPPORTING_DOCUMENTS,
	type DemoSupportingDocument
} from './demo-supporting-documents';

// Demo supporting documents (seeders/demo-supporting-documents.ts), filed through the same
// service the upload form uses, as the demo coordinator. Idempotent: a document whose owner
// already has one with the same title is skipped.

/** A one-page PDF with the demo text, in pdfkit's built-in Helvetica. */
function demoPdf(doc: DemoSupportingDocument): Promise<Uint8Array> {
	return new Promise((resolve, reject) => {
		const pdf = new PDFDocument({
			size: 'A4',
			margin: 56,
			info: { Title: doc.title, Producer: 'Landfall demo seed', CreationDate: new Date(0) }
		});
		const chunks: Buffer[] = [];
		pdf.on('data', (c: Buffer) => chunks.push(c));
		pdf.on('end', () => resolve(new Uint8Array(Buffer.concat(chunks))));
		pdf.on('error', reject);
		pdf.fontSize(16).text(doc.heading).moveDown();
		pdf.fontSize(11).text(doc.title).moveDown();
		for (const line of doc.lines) pdf.text(line);
		pdf.moveDown().fontSize(9).fillColor('#555555');
		pdf.text('Landfall demo data: invented companies and people. Not a real document.');
		pdf.end();
	});
}

const addDays = (days: number) =>
	new Date(Date.now() + days * 24 * 60 * 60 * 1000).toISOString().slice(0, 10);

export async function seed(sequelize: Sequelize): Promise<void> {
	const coordinator = await User.findOne({
		where: { email: 'coordinator@solvrae.example' },
		rejectOnEmpty: true
	});
	const user = await loadSessionUser(coordinator.id);
	if (!user) throw new Error('The demo coordinator cannot sign in: seed the users first');
	for (const doc of DEMO_SUPPORTING_DOCUMENTS) {
		const owner =
			'sku' in doc.owner
				? {
						productId: (
							await Product.findOne({ where: { sku: doc.owner.sku }, rejectOnEmpty: true })
						).id
					}
				: {
						shipmentId: (
							await Shipment.findOne({
								where: { reference: doc.owner.shipmentReference },
								rejectOnEmpty: true
							})
						).id
					};
		const [existing] = await sequelize.query(
			`SELECT 1 FROM supporting_documents
			  WHERE title = :title AND (product_id = :ownerId OR shipment_id = :ownerId)`,
			{
				replacements: {
					title: doc.title,
					ownerId: 'productId' in owner ? owner.productId : owner.shipmentId
				}
			}
		);
		if (existing.length > 0) continue;
		const result = await uploadSupportingDocument(
			user,
			owner,
			{
				kind: doc.kind,
				title: doc.title,
				issuedOn: doc.issuedOn,
				expiresOn: doc.expiresInDays === null ? null : addDays(doc.expiresInDays),
				fileName: doc.fileName,
				bytes: await demoPdf(doc)
			},
			null
		);
		if (!result.ok) throw new Error(`Demo document ${doc.title}: ${result.message}`);
	}
}
