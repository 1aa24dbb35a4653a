import { describe, expect, it } from 'vitest';
import { openApiDocument } from './openapi';

describe('OpenAPI document', () => {
	const doc = openApiDocument('http://127.0.0.1:4310');

	it('is OpenAPI 3.1 with the shipment and measure paths', () => {
		expect(doc.openapi).toBe('3.1.0');
		expect(Object.keys(doc.paths)).toEqual(
			expect.arrayContaining([
				'/shipments',
				'/shipments/{shipmentId}',
				'/shipments/{shipmentId}/measure',
				'/shipments/{shipmentId}/documents',
				'/shipments/{shipmentId}/landed-cost',
				'/shipments/{shipmentId}/documents/{documentId}',
				'/shipments/{shipmentId}/documents.zip',
				'/shipments/{shipmentId}/deposits',
				'/stripe/webhook',
				'/calc/measure',
				'/calc/landed-cost'
			])
		);
	});

	it('takes the request schemas from the validating zod schemas', () => {
		const header = doc.components.schemas.ShipmentHeader as {
			properties: Record<string, unknown>;
			required: string[];
		};
		expect(Object.keys(header.properties)).toEqual(
			expect.arrayContaining(['customerId', 'incoterm', 'modesConsidered', 'version'])
		);
		const measure = doc.components.schemas.MeasureInput as { properties: Record<string, unknown> };
		expect(Object.keys(measure.properties)).toEqual(expect.arrayContaining(['products', 'lines']));
		expect(JSON.stringify(doc)).toContain('Whole millimetres');
		const landed = doc.components.schemas.LandedCostInput as {
			properties: Record<string, unknown>;
			required: string[];
		};
		expect(landed.required).toEqual(expect.arrayContaining(['lines', 'rateCard', 'tariffRows']));
	});
});
