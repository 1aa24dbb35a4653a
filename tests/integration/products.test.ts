// The products service (saveProduct, getProduct) and the product schema against the real
// database. The actor is the demo coordinator; every product a test saves has an SKU of its own
// (ITEST-…) and is deleted again when the file ends. Demo products are only read.
import { randomUUID } from 'node:crypto';
import { col, fn, where } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { z } from 'zod';
import type { SessionUser } from '$lib/server/auth/session-user';
import { AuditEvent, Product } from '$lib/server/db/models';
import { productFormValues } from '$lib/server/services/product-form';
import { getProduct, saveProduct, type ProductRow } from '$lib/server/services/products';
import type { ServiceResult } from '$lib/server/services/users';
import { productSchema, type ProductInput } from '$lib/schemas/products';
import { inchesToMm, lbToKg } from '$lib/packing/units';
import { countRows, sessionUserFor, uniqueSuffix } from './db';
import { ok } from './service-results';

const IP = '198.51.100.78'; // RFC 5737 TEST-NET-2: only stored in audit_events.ip

let coordinator: SessionUser;
const createdProducts = new Set<string>();

beforeAll(async () => {
	coordinator = await sessionUserFor('coordinator@solvrae.example');
});

// Registered after db.ts's own afterAll, so it runs first (vitest runs after-hooks as a stack)
// while the connection is still open. Packaging goes with the product (ON DELETE CASCADE).
afterAll(async () => {
	if (createdProducts.size > 0) {
		await Product.destroy({ where: { id: [...createdProducts] } });
	}
});

const uniqueSku = () => `ITEST-${uniqueSuffix()}`.toUpperCase();

/** An invented speaker, metric: 12 per carton, 400 × 300 × 250 mm, 8.64 kg full carton. */
function productInput(overrides: Partial<z.input<typeof productSchema>> = {}): ProductInput {
	return productSchema.parse({
		sku: uniqueSku(),
		description: 'Test speaker, invented for the integration tests',
		hsCode: '8518.22.00',
		originCountry: 'MY',
		unitPrice: '38.50',
		currency: 'USD',
		units: 'metric',
		netWeightPerUnit: '0.62',
		batteryConfig: 'none',
		hasPackaging: true,
		unitsPerCarton: 12,
		cartonLength: '400',
		cartonWidth: '300',
		cartonHeight: '250',
		cartonGrossWeight: '8.64',
		orientation: 'this_way_up',
		stackable: true,
		maxLoadOnTop: '60',
		...overrides
	});
}

function refused<T>(result: ServiceResult<T>) {
	if (result.ok) throw new Error(`Expected a refusal, got ${JSON.stringify(result.value)}`);
	return result;
}

async function createProduct(input: ProductInput): Promise<ProductRow> {
	const row = ok(await saveProduct(coordinator, null, input, IP), 'create product');
	createdProducts.add(row.id);
	return row;
}

/** Save a change to a stored product the way the edit form does: its values, then the change. */
async function edit(
	row: ProductRow,
	change: Partial<z.input<typeof productSchema>>,
	version = row.version
) {
	const input = productSchema.parse({ ...productFormValues(row), ...change, version });
	return saveProduct(coordinator, row.id, input, IP);
}

async function auditEvents(id: string) {
	return AuditEvent.findAll({
		where: { entity: 'product', entityId: id },
		order: [['id', 'ASC']],
		raw: true
	});
}

const countSku = (sku: string) =>
	Product.count({ where: where(fn('lower', col('sku')), sku.toLowerCase()) });

describe('saveProduct with metric input', () => {
	it('creates the product with its packaging, as stored (kg to 3 or 4 decimals, whole mm)', async () => {
		const input = productInput();
		const row = await createProduct(input);
		expect(row).toMatchObject({
			sku: input.sku,
			hsCode: '85182200',
			originCountry: 'MY',
			unitPrice: '38.5000',
			currency: 'USD',
			netKgPerUnit: '0.6200',
			batteryConfig: 'none',
			batteryChemistry: null,
			batteryWh: null,
			version: 0,
			packaging: {
				unitsPerCarton: 12,
				cartonLengthMm: 400,
				cartonWidthMm: 300,
				cartonHeightMm: 250,
				cartonGrossKg: '8.640',
				orientation: 'this_way_up',
				maxLoadOnTopKg: '60.000'
			}
		});
		expect(await getProduct(row.id)).toEqual(row);
		const audit = await auditEvents(row.id);
		expect(audit.map((a) => a.action)).toEqual(['product.create']);
		expect(audit[0]).toMatchObject({ actorUserId: coordinator.id, before: null, ip: IP });
		expect(audit[0]!.after).toMatchObject({ sku: input.sku, netKgPerUnit: '0.6200' });
	});

	it('rounds millimetres half up to whole mm; a non-stackable carton has no load on top', async () => {
		const row = await createProduct(
			productInput({
				cartonLength: '400.5',
				cartonWidth: '299.49',
				stackable: false,
				maxLoadOnTop: ''
			})
		);
		expect(row.packaging).toMatchObject({
			cartonLengthMm: 401,
			cartonWidthMm: 299,
			maxLoadOnTopKg: null
		});
	});

	it('creates a product without packaging', async () => {
		const row = await createProduct(
			productInput({
				hasPackaging: false,
				unitsPerCarton: undefined,
				cartonLength: '',
				cartonWidth: '',
				cartonHeight: '',
				cartonGrossWeight: '',
				maxLoadOnTop: ''
			})
		);
		expect(row.packaging).toBeNull();
	});

	it('updates the product and its packaging, bumping the version', async () => {
		const row = await createProduct(productInput());
		const updated = ok(
			await edit(row, {
				description: 'Test speaker, second edition',
				unitPrice: '36.90',
				unitsPerCarton: 10,
				cartonGrossWeight: '7.40'
			}),
			'update'
		);
		expect(updated).toMatchObject({
			id: row.id,
			description: 'Test speaker, second edition',
			unitPrice: '36.9000',
			version: 1,
			packaging: { unitsPerCarton: 10, cartonGrossKg: '7.400', cartonLengthMm: 400 }
		});
		const audit = await auditEvents(row.id);
		expect(audit.map((a) => a.action)).toEqual(['product.create', 'product.update']);
		expect(audit[1]!.before).toMatchObject({ unitPrice: '38.5000', version: 0 });
		expect(audit[1]!.after).toMatchObject({ unitPrice: '36.9000', version: 1 });
	});

	it('answers 409 for a stale version and keeps the other editor’s change', async () => {
		const row = await createProduct(productInput());
		ok(await edit(row, { description: 'Changed by the first editor' }), 'first edit');
		const stale = refused(await edit(row, { description: 'Changed by the second editor' }, 0));
		expect(stale.status).toBe(409);
		expect((await getProduct(row.id))!).toMatchObject({
			description: 'Changed by the first editor',
			version: 1
		});
		expect((await auditEvents(row.id)).map((a) => a.action)).toEqual([
			'product.create',
			'product.update'
		]);
	});

	// The packaging is part of the product: a change to it alone must bump the version as well,
	// or a second editor holding the same version overwrites it without a 409.
	it('bumps the version when only the packaging changes, so a stale editor gets 409', async () => {
		const row = await createProduct(productInput());
		// Two editors open the product at version 0; the first changes only the carton gross.
		const first = ok(await edit(row, { cartonGrossWeight: '8.700' }), 'packaging-only edit');
		expect(first.packaging?.cartonGrossKg).toBe('8.700');
		expect(first.version).toBe(1);
		const second = refused(await edit(row, { description: 'Second editor, stale form' }));
		expect(second.status).toBe(409);
		expect((await getProduct(row.id))?.packaging?.cartonGrossKg).toBe('8.700');
	});

	it('answers 404 for a product that does not exist', async () => {
		const result = refused(
			await saveProduct(coordinator, randomUUID(), productInput({ version: 0 }), IP)
		);
		expect(result.status).toBe(404);
	});
});

describe('saveProduct with imperial input', () => {
	// Exact factors: 1 in = 25.4 mm and 1 lb = 0.45359237 kg (international yard and pound
	// agreement, 1959; NIST SP 811, 2008 edition, Appendix B.8 and B.9).
	it('converts exactly before rounding: 15.75 in = 400.05 mm, 19.05 lb = 8.6409346485 kg', () => {
		expect(inchesToMm('15.75').toString()).toBe('400.05');
		expect(lbToKg('19.05').toString()).toBe('8.6409346485');
		expect(lbToKg('1.367').toString()).toBe('0.62006076979');
	});

	it('stores whole mm and kg to the gram (0.1 g per unit)', async () => {
		const row = await createProduct(
			productInput({
				units: 'imperial',
				netWeightPerUnit: '1.367', // 0.62006076979 kg → 0.6201
				cartonLength: '15.75', // 400.05 mm → 400
				cartonWidth: '11.81', // 299.974 mm → 300
				cartonHeight: '9.84', // 249.936 mm → 250
				cartonGrossWeight: '19.05', // 8.6409346485 kg → 8.641
				maxLoadOnTop: '132.28' // 60.0011987... kg → 60.001
			})
		);
		expect(row.netKgPerUnit).toBe('0.6201');
		expect(row.packaging).toMatchObject({
			cartonLengthMm: 400,
			cartonWidthMm: 300,
			cartonHeightMm: 250,
			cartonGrossKg: '8.641',
			maxLoadOnTopKg: '60.001'
		});
		// Stored metric: the edit form shows the stored values in mm and kg.
		expect(productFormValues(row)).toMatchObject({
			units: 'metric',
			cartonLength: '400',
			cartonGrossWeight: '8.641'
		});
	});
});

describe('saveProduct refusals', () => {
	it('refuses a carton gross below units × net weight (fieldErrors.cartonGrossWeight), no row', async () => {
		const input = productInput({ cartonGrossWeight: '7.43' }); // 12 × 0.62 = 7.44 kg
		const before = await countRows('products');
		const result = refused(await saveProduct(coordinator, null, input, IP));
		expect(result.status).toBe(400);
		expect(Object.keys(result.fieldErrors)).toEqual(['cartonGrossWeight']);
		expect(result.fieldErrors.cartonGrossWeight).toContain('7.440 kg');
		expect(await countRows('products')).toBe(before);
		expect(await countSku(input.sku)).toBe(0);
	});

	it('refuses a this-way-up carton taller than every container door (fieldErrors.cartonHeight), no row', async () => {
		// The seeded container types' door openings are at most 2577 mm high (data/container-types.json).
		const input = productInput({
			cartonLength: '1000',
			cartonWidth: '800',
			cartonHeight: '2600',
			cartonGrossWeight: '80'
		});
		const before = await countRows('products');
		const result = refused(await saveProduct(coordinator, null, input, IP));
		expect(result.status).toBe(400);
		expect(Object.keys(result.fieldErrors)).toEqual(['cartonHeight']);
		expect(result.fieldErrors.cartonHeight).toMatch(/does not pass the door of any container/);
		expect(await countRows('products')).toBe(before);
		// The same carton may be laid on its side: then it goes in.
		const row = await createProduct({ ...input, sku: uniqueSku(), orientation: 'any' });
		expect(row.packaging?.cartonHeightMm).toBe(2600);
	});

	it('accepts a carton gross equal to the contents', async () => {
		const row = await createProduct(productInput({ cartonGrossWeight: '7.44' }));
		expect(row.packaging?.cartonGrossKg).toBe('7.440');
	});

	it('compares the converted masses for imperial input', async () => {
		// 12 × 1.367 lb → 12 × 0.6201 kg = 7.4412 kg; 16.4 lb = 7.438915… kg → 7.439 kg.
		const result = refused(
			await saveProduct(
				coordinator,
				null,
				productInput({
					units: 'imperial',
					netWeightPerUnit: '1.367',
					cartonLength: '15.75',
					cartonWidth: '11.81',
					cartonHeight: '9.84',
					cartonGrossWeight: '16.4',
					maxLoadOnTop: '132.28'
				}),
				IP
			)
		);
		expect(result.fieldErrors).toHaveProperty('cartonGrossWeight');
	});

	it('refuses an SKU that another product has in other case (fieldErrors.sku), no row', async () => {
		expect(await countSku('SLV-PBL-20')).toBe(1);
		const auditBefore = await countRows('audit_events', "entity = 'product'");
		const result = refused(
			await saveProduct(coordinator, null, productInput({ sku: 'slv-pbl-20' }), IP)
		);
		expect(result.status).toBe(400);
		expect(Object.keys(result.fieldErrors)).toEqual(['sku']);
		expect(await countSku('SLV-PBL-20')).toBe(1);
		expect(await countRows('audit_events', "entity = 'product'")).toBe(auditBefore);
	});

	it('refuses renaming a product to another one’s SKU in other case, and keeps it as it was', async () => {
		const row = await createProduct(productInput());
		const result = refused(await edit(row, { sku: 'Slv-Twr-80' }));
		expect(result.fieldErrors).toHaveProperty('sku');
		expect(await getProduct(row.id)).toEqual(row);
	});
});

describe('productSchema HS codes', () => {
	const hsIssue = (hsCode: string) => {
		const result = productSchema.safeParse({ ...productInput(), hsCode });
		expect(result.success, hsCode).toBe(false);
		return result.error!.issues.find((i) => i.path.join('.') === 'hsCode')?.message;
	};

	// WCO, HS Convention (1983), Art. 3: 6 digits are the international HS (chapter, heading,
	// subheading).
	it('rejects 8518.2 (5 digits) with a message', () => {
		expect(hsIssue('8518.2')).toMatch(/at least 6 digits/);
	});

	// WCO, HS Nomenclature 2022 edition, Section XV: chapter 77 is reserved for future use.
	it('rejects 7701.00 (chapter 77) with a message', () => {
		expect(hsIssue('7701.00')).toMatch(/Chapter 77 is reserved/);
	});

	it('rejects 7 digits and accepts 6, 8 and 10 with dots or spaces, stored as digits', () => {
		expect(hsIssue('8518.22.0')).toMatch(/8 or 10 digits/);
		expect(productInput({ hsCode: '8518.22' }).hsCode).toBe('851822');
		expect(productInput({ hsCode: '8518 22 00' }).hsCode).toBe('85182200');
		expect(productInput({ hsCode: '8518.22.00.00' }).hsCode).toBe('8518220000');
	});
});

describe('battery watt-hours', () => {
	const battery = {
		batteryConfig: 'contained',
		batteryChemistry: 'lithium_ion',
		cellsPerBattery: 1,
		batteriesPerUnit: 1
	} as const;

	// Wh = Ah × V: 49 CFR § 171.8 (US DOT PHMSA), definition of "Watt-hour" (Wh rating of a
	// lithium cell or battery = rated capacity in Ah × nominal voltage).
	it('computes Wh as V × Ah when only voltage and capacity are given: 3.7 V × 2.6 Ah = 9.62 Wh', async () => {
		const row = await createProduct(
			productInput({ ...battery, nominalVoltage: '3.7', capacityAh: '2.6' })
		);
		expect(row).toMatchObject({
			batteryConfig: 'contained',
			batteryChemistry: 'lithium_ion',
			nominalVoltage: '3.700',
			capacityAh: '2.6000',
			batteryWh: '9.62'
		});
	});

	it('keeps a Wh figure that is given instead of computing one', async () => {
		const row = await createProduct(
			productInput({ ...battery, batteryWh: '9.5', nominalVoltage: '3.7', capacityAh: '2.6' })
		);
		expect(row.batteryWh).toBe('9.50');
	});

	it('asks for Wh, or voltage and capacity, for a lithium-ion battery', () => {
		const result = productSchema.safeParse({
			...productInput(),
			...battery,
			nominalVoltage: '3.7'
		});
		expect(result.success).toBe(false);
		const issue = result.error!.issues.find((i) => i.path.join('.') === 'batteryWh');
		expect(issue?.message).toContain('Wh = V × Ah');
	});

	it('stores no battery figures for a product without a battery', async () => {
		const row = await createProduct(
			productInput({ batteryConfig: 'none', nominalVoltage: '3.7', capacityAh: '2.6' })
		);
		expect(row).toMatchObject({
			batteryChemistry: null,
			nominalVoltage: null,
			capacityAh: null,
			batteryWh: null
		});
	});
});
