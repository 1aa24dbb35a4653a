import Decimal from 'decimal.js';
import { col, fn, Op, QueryTypes, UniqueConstraintError, where } from 'sequelize';
import type { ProductInput } from '../../schemas/products';
import { lbToKg, inchesToMm } from '../../packing/units';
import type { SessionUser } from '../auth/session-user';
import { ContainerTypeRow, Product, ProductPackaging, type BatteryConfig } from '../db/models';
import { doorProblem } from '../../packing/door';
import { recordAudit } from './audit';
import { invalid, type ServiceResult } from './result';

export interface ProductRow {
	id: string;
	sku: string;
	description: string;
	hsCode: string;
	originCountry: string;
	unitPrice: string;
	currency: string;
	netKgPerUnit: string;
	batteryConfig: BatteryConfig;
	batteryChemistry: Product['batteryChemistry'];
	cellWh: string | null;
	batteryWh: string | null;
	cellLithiumG: string | null;
	batteryLithiumG: string | null;
	nominalVoltage: string | null;
	capacityAh: string | null;
	cellsPerBattery: number | null;
	batteriesPerUnit: number | null;
	version: number;
	packaging: {
		unitsPerCarton: number;
		cartonLengthMm: number;
		cartonWidthMm: number;
		cartonHeightMm: number;
		cartonGrossKg: string;
		orientation: 'any' | 'this_way_up';
		maxLoadOnTopKg: string | null;
	} | null;
}

type ProductWithPackaging = Product & { packaging?: ProductPackaging | null };

function toRow(p: ProductWithPackaging): ProductRow {
	const g = p.packaging;
	return {
		id: p.id,
		sku: p.sku,
		description: p.description,
		hsCode: p.hsCode,
		originCountry: p.originCountry,
		unitPrice: p.unitPrice,
		currency: p.currency,
		netKgPerUnit: p.netKgPerUnit,
		batteryConfig: p.batteryConfig,
		batteryChemistry: p.batteryChemistry,
		cellWh: p.cellWh,
		batteryWh: p.batteryWh,
		cellLithiumG: p.cellLithiumG,
		batteryLithiumG: p.batteryLithiumG,
		nominalVoltage: p.nominalVoltage,
		capacityAh: p.capacityAh,
		cellsPerBattery: p.cellsPerBattery,
		batteriesPerUnit: p.batteriesPerUnit,
		version: p.version,
		packaging: g
			? {
					unitsPerCarton: g.unitsPerCarton,
					cartonLengthMm: g.cartonLengthMm,
					cartonWidthMm: g.cartonWidthMm,
					cartonHeightMm: g.cartonHeightMm,
					cartonGrossKg: g.cartonGrossKg,
					orientation: g.orientation,
					maxLoadOnTopKg: g.maxLoadOnTopKg
				}
			: null
	};
}

const include = [{ model: ProductPackaging, as: 'packaging' }];

export async function listProducts(): Promise<ProductRow[]> {
	const products = await Product.findAll({ include, order: [['sku', 'ASC']] });
	return products.map(toRow);
}

export async function getProduct(id: string): Promise<ProductRow | null> {
	const product = await Product.findByPk(id, { include });
	return product ? toRow(product) : null;
}

export async function productsBySku(skus: string[]): Promise<Map<string, ProductRow>> {
	if (skus.length === 0) return new Map();
	const products = await Product.findAll({
		include,
		where: where(fn('lower', col('Product.sku')), {
			[Op.in]: [...new Set(skus.map((s) => s.toLowerCase()))]
		})
	});
	return new Map(products.map((p) => [p.sku.toLowerCase(), toRow(p)]));
}

// Entered lengths → whole mm; masses → kg to the gram (3 decimals) or 0.1 g per unit (4).
const toMm = (value: string, units: ProductInput['units']) =>
	(units === 'imperial' ? new Decimal(inchesToMm(value)) : new Decimal(value))
		.toDecimalPlaces(0, Decimal.ROUND_HALF_UP)
		.toNumber();
const toKg = (value: string, units: ProductInput['units'], places: number) =>
	(units === 'imperial' ? new Decimal(lbToKg(value)) : new Decimal(value))
		.toDecimalPlaces(places, Decimal.ROUND_HALF_UP)
		.toFixed(places);
const orNull = (value: string | undefined) => (value ? value : null);

function productFields(input: ProductInput) {
	const battery = input.batteryConfig !== 'none';
	// Wh = V × Ah when only voltage and capacity are known (IEC/IATA practice for cells and batteries).
	const computedWh =
		battery && input.nominalVoltage && input.capacityAh
			? new Decimal(input.nominalVoltage).times(input.capacityAh).toDecimalPlaces(2).toFixed(2)
			: null;
	return {
		sku: input.sku,
		description: input.description,
		hsCode: input.hsCode,
		originCountry: input.originCountry,
		unitPrice: input.unitPrice,
		currency: input.currency,
		netKgPerUnit: toKg(input.netWeightPerUnit, input.units, 4),
		batteryConfig: input.batteryConfig,
		batteryChemistry: battery && input.batteryChemistry ? input.batteryChemistry : null,
		cellWh: battery ? orNull(input.cellWh) : null,
		batteryWh: battery ? (orNull(input.batteryWh) ?? computedWh) : null,
		cellLithiumG: battery ? orNull(input.cellLithiumG) : null,
		batteryLithiumG: battery ? orNull(input.batteryLithiumG) : null,
		nominalVoltage: battery ? orNull(input.nominalVoltage) : null,
		capacityAh: battery ? orNull(input.capacityAh) : null,
		cellsPerBattery: battery ? (input.cellsPerBattery ?? null) : null,
		batteriesPerUnit: battery ? (input.batteriesPerUnit ?? null) : null
	};
}

function packagingFields(input: ProductInput) {
	if (!input.hasPackaging) return null;
	return {
		unitsPerCarton: input.unitsPerCarton!,
		cartonLengthMm: toMm(input.cartonLength!, input.units),
		cartonWidthMm: toMm(input.cartonWidth!, input.units),
		cartonHeightMm: toMm(input.cartonHeight!, input.units),
		cartonGrossKg: toKg(input.cartonGrossWeight!, input.units, 3),
		orientation: input.orientation,
		maxLoadOnTopKg: input.stackable ? toKg(input.maxLoadOnTop!, input.units, 3) : null
	};
}

/** A full carton cannot weigh less than its contents. */
function checkCartonWeight(input: ProductInput) {
	const packaging = packagingFields(input);
	if (!packaging) return null;
	const contents = new Decimal(toKg(input.netWeightPerUnit, input.units, 4)).times(
		packaging.unitsPerCarton
	);
	if (new Decimal(packaging.cartonGrossKg).lessThan(contents)) {
		return invalid({
			cartonGrossWeight: `A full carton holds ${contents.toFixed(3)} kg of product (${packaging.unitsPerCarton} × net weight); its gross weight cannot be less.`
		});
	}
	return null;
}

/** A carton no container door takes cannot go by sea container or be stuffed at all. */
async function checkCartonDoor(input: ProductInput) {
	const packaging = packagingFields(input);
	if (!packaging) return null;
	const containers = await ContainerTypeRow.findAll({ raw: true });
	const message = doorProblem(
		{
			lengthMm: packaging.cartonLengthMm,
			widthMm: packaging.cartonWidthMm,
			heightMm: packaging.cartonHeightMm,
			orientation: packaging.orientation
		},
		containers
	);
	if (!message) return null;
	return invalid(
		packaging.orientation === 'this_way_up' ? { cartonHeight: message } : { cartonLength: message }
	);
}

export async function saveProduct(
	actor: SessionUser,
	id: string | null,
	input: ProductInput,
	ip: string | null
): Promise<ServiceResult<ProductRow>> {
	const weightProblem = checkCartonWeight(input) ?? (await checkCartonDoor(input));
	if (weightProblem) return weightProblem;
	try {
		const savedId = await Product.sequelize!.transaction(async (transaction) => {
			let product: Product | null;
			let before: ProductRow | null = null;
			if (id) {
				// Lock the product row only (FOR UPDATE cannot lock the outer-joined packaging).
				product = await Product.findByPk(id, {
					include,
					transaction,
					lock: { level: transaction.LOCK.UPDATE, of: Product }
				});
				if (!product) return null;
				before = toRow(product);
				// Optimistic lock in SQL, so a change to the packaging alone also bumps the version.
				const [, bumped] = await Product.sequelize!.query(
					'UPDATE products SET version = version + 1, updated_at = now() WHERE id = :id AND version = :version',
					{ replacements: { id, version: input.version }, transaction, type: QueryTypes.UPDATE }
				);
				if (bumped !== 1) return 'conflict' as const;
				await Product.update(productFields(input), { where: { id }, transaction, silent: true });
			} else {
				product = await Product.create(productFields(input), { transaction });
			}
			const packaging = packagingFields(input);
			await ProductPackaging.destroy({ where: { productId: product.id }, transaction });
			if (packaging)
				await ProductPackaging.create({ productId: product.id, ...packaging }, { transaction });
			const after = toRow((await Product.findByPk(product.id, { include, transaction }))!);
			await recordAudit(
				{
					actorUserId: actor.id,
					action: id ? 'product.update' : 'product.create',
					entity: 'product',
					entityId: product.id,
					before: before as unknown as Record<string, unknown> | null,
					after: after as unknown as Record<string, unknown>,
					ip
				},
				transaction
			);
			return product.id;
		});
		if (savedId === null)
			return { ok: false, status: 404, message: 'No such product.', fieldErrors: {} };
		if (savedId === 'conflict') {
			return {
				ok: false,
				status: 409,
				message:
					'Someone else changed this product while you were editing. Reload to see their change.',
				fieldErrors: {}
			};
		}
		return { ok: true, value: (await getProduct(savedId))! };
	} catch (error) {
		if (error instanceof UniqueConstraintError)
			return invalid({ sku: 'Another product already has this SKU.' });
		throw error;
	}
}
