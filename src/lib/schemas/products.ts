import { z } from 'zod';
import { BATTERY_CHEMISTRY_VALUES, BATTERY_CONFIG_VALUES } from '../products';
import {
	countryCode,
	currencyCode,
	decimalString,
	hsCode,
	optionalDecimalString,
	positiveInt
} from './fields';

export const UNIT_SYSTEMS = ['metric', 'imperial'] as const;

/** The product form and the products API body; lengths in mm or in, masses in kg or lb. */
export const productSchema = z
	.object({
		sku: z
			.string()
			.trim()
			.regex(
				/^[A-Za-z0-9][A-Za-z0-9._/-]{0,39}$/,
				'SKU: letters, digits and . _ / - only, up to 40 characters.'
			),
		description: z.string().trim().min(1, 'Describe the product.').max(300),
		hsCode,
		originCountry: countryCode,
		unitPrice: decimalString('Unit price', 4, 'zero'),
		currency: currencyCode,
		units: z.enum(UNIT_SYSTEMS).default('metric'),
		netWeightPerUnit: decimalString('Net weight per unit', 4),
		batteryConfig: z.enum(BATTERY_CONFIG_VALUES).default('none'),
		batteryChemistry: z.enum(['', ...BATTERY_CHEMISTRY_VALUES]).default(''),
		cellWh: optionalDecimalString('Watt-hours per cell', 2),
		batteryWh: optionalDecimalString('Watt-hours per battery', 2),
		cellLithiumG: optionalDecimalString('Lithium per cell (g)', 3),
		batteryLithiumG: optionalDecimalString('Lithium per battery (g)', 3),
		nominalVoltage: optionalDecimalString('Nominal voltage', 3),
		capacityAh: optionalDecimalString('Capacity (Ah)', 4),
		cellsPerBattery: positiveInt('Cells per battery', 1000).optional(),
		batteriesPerUnit: positiveInt('Batteries per unit', 1000).optional(),
		hasPackaging: z.boolean().default(true),
		unitsPerCarton: positiveInt('Units per carton', 100_000).optional(),
		cartonLength: optionalDecimalString('Carton length', 2),
		cartonWidth: optionalDecimalString('Carton width', 2),
		cartonHeight: optionalDecimalString('Carton height', 2),
		cartonGrossWeight: optionalDecimalString('Carton gross weight', 3),
		orientation: z.enum(['any', 'this_way_up']).default('any'),
		stackable: z.boolean().default(true),
		maxLoadOnTop: optionalDecimalString('Maximum load on top', 3),
		version: z.number().int().min(0).default(0)
	})
	.superRefine((p, ctx) => {
		const need = (field: keyof typeof p, message: string) => {
			if (p[field] === undefined || p[field] === '') {
				ctx.addIssue({ code: 'custom', path: [field], message });
			}
		};
		if (p.batteryConfig !== 'none') {
			need('batteryChemistry', 'Choose the battery chemistry.');
			if (p.batteryChemistry === 'lithium_ion' && !p.cellWh && !p.batteryWh) {
				if (!p.nominalVoltage || !p.capacityAh) {
					ctx.addIssue({
						code: 'custom',
						path: ['batteryWh'],
						message:
							'Give the watt-hours, or the voltage and capacity to compute them (Wh = V × Ah).'
					});
				}
			}
			if (p.batteryChemistry === 'lithium_metal' && !p.cellLithiumG && !p.batteryLithiumG) {
				ctx.addIssue({
					code: 'custom',
					path: ['batteryLithiumG'],
					message: 'Give the lithium content in grams (per cell or per battery).'
				});
			}
		}
		if (p.hasPackaging) {
			need('unitsPerCarton', 'How many units go in one carton?');
			need('cartonLength', 'Enter the carton’s outer length.');
			need('cartonWidth', 'Enter the carton’s outer width.');
			need('cartonHeight', 'Enter the carton’s outer height.');
			need('cartonGrossWeight', 'Enter the gross weight of a full carton.');
			if (p.stackable) need('maxLoadOnTop', 'How much may stand on top of one carton?');
		}
	});
export type ProductInput = z.infer<typeof productSchema>;
