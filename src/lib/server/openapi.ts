import { z } from 'zod';
import { measureInputSchema, measureResultSchema } from '../packing/schema';
import { createUserSchema, updateUserSchema } from '../schemas/users';
import {
	API_MAX_PIECES,
	API_MAX_TIME_BUDGET_MS,
	loadPlanInputSchema,
	loadPlanSchema
} from '../schemas/load-plan';
import { issuePapersSchema } from '../schemas/documents';
import { landedCostQuerySchema } from '../schemas/landed-cost';
import { CALC_MAX_LINES, landedCostInputSchema } from '../schemas/landed-cost-input';
import { productSchema } from '../schemas/products';
import { shipmentLinesSchema, shipmentListQuerySchema, shipmentSchema } from '../schemas/shipments';

// The OpenAPI 3.1 document, generated from the same zod schemas that validate the requests.
const schema = (s: z.ZodType) =>
	z.toJSONSchema(s, { io: 'input', unrepresentable: 'any', target: 'draft-2020-12' });

const error = {
	description: 'Refused: `{ message, code, issues?: [{ path, message }] }`',
	content: { 'application/json': { schema: { $ref: '#/components/schemas/Error' } } }
};
const errors = { 400: error, 401: error, 403: error, 404: error, 409: error };
const body = (ref: string) => ({
	required: true,
	content: { 'application/json': { schema: { $ref: `#/components/schemas/${ref}` } } }
});
const ok = (description: string, ref?: string) => ({
	description,
	content: { 'application/json': { schema: ref ? { $ref: `#/components/schemas/${ref}` } : {} } }
});
const idParam = (name: string) => ({
	name,
	in: 'path',
	required: true,
	schema: { type: 'string', format: 'uuid' }
});

export function openApiDocument(origin: string) {
	const query = schema(shipmentListQuerySchema) as { properties: Record<string, object> };
	return {
		openapi: '3.1.0',
		info: {
			title: 'Landfall API',
			version: '1',
			description:
				'Shipments, products, packing measures, load plans and customs papers. Authenticate with the session cookie of a signed-in user. Customers see only their organization’s rows.'
		},
		servers: [{ url: `${origin}/api/v1` }],
		paths: {
			'/shipments': {
				get: {
					summary: 'List shipments (filtered, sorted, paged)',
					parameters: Object.entries(query.properties).map(([name, s]) => ({
						name,
						in: 'query',
						schema: s
					})),
					responses: { 200: ok('A page of shipments'), ...errors }
				},
				post: {
					summary: 'Create a draft shipment',
					requestBody: body('ShipmentHeader'),
					responses: { 201: ok('Created: id and reference'), ...errors }
				}
			},
			'/shipments/{shipmentId}': {
				parameters: [idParam('shipmentId')],
				get: { summary: 'Read a shipment', responses: { 200: ok('The shipment'), ...errors } },
				patch: {
					summary: 'Replace the header (send the version you read)',
					requestBody: body('ShipmentHeader'),
					responses: { 200: ok('The shipment'), ...errors }
				}
			},
			'/shipments/{shipmentId}/lines': {
				parameters: [idParam('shipmentId')],
				put: {
					summary: 'Replace all lines',
					requestBody: body('ShipmentLines'),
					responses: { 200: ok('The shipment'), ...errors }
				}
			},
			'/shipments/{shipmentId}/measure': {
				parameters: [idParam('shipmentId')],
				get: {
					summary: 'Cartons, pallets, weights and chargeable weights',
					responses: { 200: ok('Measure'), ...errors }
				}
			},
			'/shipments/{shipmentId}/load-plan': {
				parameters: [idParam('shipmentId')],
				get: {
					summary: 'Container load plan of the current revision (cached, else computed)',
					description:
						'Cartons (or loaded pallets) of the shipment planned into every container type. Computed in a worker with a time budget of about 3 s, then cached for this revision. Send `Accept: application/x-ndjson` to receive `{ type: "progress" }` lines and then one `{ type: "result", value }` or `{ type: "error" }` line. 409: the shipment cannot be planned (issues name why); 503: the planner was busy or stopped. A plan is guidance: the carrier, the CTU Code and trained staff decide securing, weight distribution and dangerous goods.',
					responses: {
						200: ok('Load plan with the items and container types'),
						...errors,
						503: error
					}
				}
			},
			'/shipments/{shipmentId}/landed-cost': {
				parameters: [idParam('shipmentId')],
				get: {
					summary: 'Landed cost of the shipment for one mode (staff)',
					description:
						'Goods, origin charges, freight (rate card of the lane), insurance, duty (longest HS prefix of the destination tariff, preferential when `preferenceClaimed`), import VAT/GST, customs fees, brokerage and destination charges, each with who bears it under the Incoterms rule; totals, per line and per unit (largest-remainder shares that add back exactly), transit days, carrying cost, kg CO2e, the data rows used with their dates, cautions and a trail of every figure with its formula and source. Full-container freight uses the load plan (computed when not cached). 422: data is missing or expired, with `issues` naming each gap. An estimate, not a customs ruling.',
					parameters: Object.entries(
						(schema(landedCostQuerySchema) as { properties: Record<string, object> }).properties
					).map(([name, s]) => ({ name, in: 'query', required: name === 'mode', schema: s })),
					responses: { 200: ok('The landed cost'), ...errors, 422: error }
				}
			},
			'/shipments/{shipmentId}/documents': {
				parameters: [idParam('shipmentId')],
				get: {
					summary: 'Document register: every issued paper and revision',
					description:
						'Commercial invoices and packing lists with number, revision (A, B…), reason, issue time, SHA-256 of the PDF, pages and whether each is current or superseded. Staff also see who issued, download counts and `upToDate` (false when the shipment changed since the issue) and `readiness` (what blocks issuing). Customers and brokers see the papers of the shipments they may see.',
					responses: { 200: ok('The register'), ...errors }
				},
				post: {
					summary: 'Issue papers (coordinators, administrators)',
					description:
						'Issues each paper in `kinds` not yet issued (revision A, a new gap-free number per exporter, kind and year) and reissues those already issued as the next revision of the same number, which needs a `reason`. All or nothing. 400 with `issues` naming each missing item (e.g. `paymentTerms`, `products.SKU.hsCode`) when the shipment is not ready. A booked shipment moves to documents issued.',
					requestBody: body('IssuePapers'),
					responses: {
						201: ok('The papers issued: id, kind, number, revision, sha256, pages'),
						...errors
					}
				}
			},
			'/shipments/{shipmentId}/documents/{documentId}': {
				parameters: [idParam('shipmentId'), idParam('documentId')],
				get: {
					summary: 'Download one paper (any revision) as PDF',
					description:
						'Headers `x-landfall-sha256`, `x-landfall-revision` and `x-landfall-superseded` describe the file. Every download is logged with the user and time.',
					responses: {
						200: { description: 'The PDF', content: { 'application/pdf': {} } },
						...errors
					}
				}
			},
			'/shipments/{shipmentId}/documents.zip': {
				parameters: [idParam('shipmentId')],
				get: {
					summary: 'Download the current papers as one ZIP, with a SHA256SUMS file',
					responses: {
						200: { description: 'The ZIP', content: { 'application/zip': {} } },
						...errors
					}
				}
			},
			'/shipments/{shipmentId}/deposits': {
				parameters: [idParam('shipmentId')],
				get: {
					summary: 'Freight deposits of the shipment (staff; a customer only its own)',
					description:
						"Each deposit with `amountMinor` (ISO 4217 minor units as a string: JPY 0 decimals, KWD 3) and `amount` as printed, `basis` (`amount`, or `percent` with the freight `estimate` it used), `dueDate`, `state` (`requested`, `paid`, `expired`, `cancelled`, `refunded`), what was received and when. Staff also see `mismatchReason` (a payment that did not match and was not accepted) and who requested it. A deposit becomes paid only from the payment provider's verified webhook.",
					responses: { 200: ok('{ deposits: [...] }'), ...errors }
				}
			},
			'/shipments/{shipmentId}/supporting-documents': {
				parameters: [idParam('shipmentId')],
				get: {
					summary: 'Supporting documents kept with the shipment (no file content)',
					description:
						'Certificates of origin, UN38.3 test summaries, safety data sheets, supplier declarations… filed on the shipment: `kind`, `kindLabel`, `title`, `fileName` (sanitised), `contentType` (PDF, PNG or JPEG, recognised by content), `sizeBytes`, `sha256`, `issuedOn`, `expiresOn`, `current` (not retired and not past its expiry), who uploaded it and when, `retiredAt` and the download count. Whoever sees the shipment sees its list; another organization gets a 404. Documents kept on products are not listed here.',
					responses: { 200: ok('{ documents: [...] }'), ...errors }
				}
			},
			'/shipments/{shipmentId}/supporting-documents/{documentId}': {
				parameters: [idParam('shipmentId'), idParam('documentId')],
				get: {
					summary: 'Download one supporting document of the shipment',
					description:
						'`Content-Disposition: attachment` with the sanitised name, `X-Content-Type-Options: nosniff` and `x-landfall-sha256`. Every download is logged with the user, time and client address. A document not visible to the caller is a 404.',
					responses: {
						200: {
							description: 'The file',
							content: { 'application/pdf': {}, 'image/png': {}, 'image/jpeg': {} }
						},
						...errors
					}
				}
			},
			'/stripe/webhook': {
				post: {
					summary: 'Stripe webhook endpoint (no session: the Stripe-Signature header is checked)',
					description:
						'The raw body is verified with the webhook secret (HMAC-SHA256 of `t.payload`); a bad or missing signature is a 400 and changes nothing. Each event id is applied once. Used: `checkout.session.completed`, `payment_intent.payment_failed`, `refund.created`, `charge.refunded`, `checkout.session.expired`; other types are acknowledged and ignored. 503 asks Stripe to retry.',
					responses: { 200: ok('`{ received: true, duplicate, outcome }`'), 400: error, 503: error }
				}
			},
			'/calc/load-plan': {
				post: {
					summary: 'Plan items into containers without storing anything',
					description: `At most ${API_MAX_PIECES} pieces and ${API_MAX_TIME_BUDGET_MS} ms of search per request.`,
					requestBody: body('LoadPlanInput'),
					responses: { 200: ok('Load plan', 'LoadPlan'), ...errors, 503: error }
				}
			},
			'/calc/landed-cost': {
				post: {
					summary:
						'Landed cost of given lines, measures and reference rows (staff; nothing stored)',
					description: `The engine's whole input: the same figures as \`GET /shipments/{shipmentId}/landed-cost\` when given the input that route gathers (lines, measures, rate card, tariff rows, country rules, exchange rates, insurance, brokerage, emission factor). At most ${CALC_MAX_LINES} lines. 400: malformed input, with \`issues\` naming each field (\`lines.3.unitPrice\`); 422: data missing, not valid on \`date\` or not matching the mode, with \`issues\` as the engine reports them. An estimate, not a customs ruling.`,
					requestBody: body('LandedCostInput'),
					responses: { 200: ok('The landed cost'), ...errors, 422: error }
				}
			},
			'/calc/measure': {
				post: {
					summary: 'Measure products and lines without storing anything',
					requestBody: body('MeasureInput'),
					responses: { 200: ok('Measure', 'MeasureResult'), ...errors }
				}
			},
			'/users': {
				get: { summary: 'List users (administrators)', responses: { 200: ok('Users'), ...errors } },
				post: {
					summary: 'Add a user (administrators)',
					requestBody: body('CreateUser'),
					responses: { 201: ok('The user'), ...errors }
				}
			},
			'/users/{userId}': {
				parameters: [idParam('userId')],
				patch: {
					summary: 'Change name, role or disabled (administrators)',
					requestBody: body('UpdateUser'),
					responses: { 200: ok('The user'), ...errors }
				}
			}
		},
		components: {
			schemas: {
				Error: {
					type: 'object',
					required: ['message'],
					properties: {
						message: { type: 'string' },
						code: { type: 'string' },
						issues: {
							type: 'array',
							items: {
								type: 'object',
								properties: { path: { type: 'string' }, message: { type: 'string' } }
							}
						}
					}
				},
				ShipmentHeader: schema(shipmentSchema),
				ShipmentLines: schema(shipmentLinesSchema),
				MeasureInput: schema(measureInputSchema),
				MeasureResult: schema(measureResultSchema),
				LoadPlanInput: schema(loadPlanInputSchema),
				LoadPlan: schema(loadPlanSchema),
				LandedCostInput: schema(landedCostInputSchema),
				Product: schema(productSchema),
				IssuePapers: schema(issuePapersSchema),
				CreateUser: schema(createUserSchema),
				UpdateUser: schema(updateUserSchema)
			}
		}
	};
}
