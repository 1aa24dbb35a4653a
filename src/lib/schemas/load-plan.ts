/**
 * zod schemas of POST /api/v1/calc/load-plan: the planner's input (the request body, with caps on
 * pieces and search time that suit a request), and its result (for the OpenAPI document). The
 * planner's own validateLoadInput runs after these and catches what is left (duplicate ids,
 * rates of the cheapest objective).
 */
import { z } from 'zod';
import { DECIMAL_PATTERN, MAX_MM, MESSAGES } from '../packing/problem';

/** Most pieces one API request may plan (the shipment page is not limited by this). */
export const API_MAX_PIECES = 5_000;
/** Longest search one API request may ask for, ms. */
export const API_MAX_TIME_BUDGET_MS = 10_000;

const mm = (what: string) =>
	z
		.number({ error: MESSAGES.positiveMm })
		.int({ error: MESSAGES.positiveMm })
		.min(1, { error: MESSAGES.positiveMm })
		.max(MAX_MM, { error: MESSAGES.positiveMm })
		.describe(`${what}. Whole millimetres, 1 to ${MAX_MM}.`);
const kg = (what: string) =>
	z
		.string({ error: MESSAGES.decimal })
		.regex(DECIMAL_PATTERN, { error: MESSAGES.decimal })
		.describe(`${what}. Kilograms as a decimal string, e.g. "12.5" (up to 6 decimals).`);
const id = z
	.string({ error: 'Enter an id of 1 to 100 characters.' })
	.trim()
	.min(1, { error: 'Enter an id of 1 to 100 characters.' })
	.max(100, { error: 'Enter an id of 1 to 100 characters.' });
const wholeNumber = (min: number, max: number) =>
	z
		.number({ error: `Enter a whole number from ${min} to ${max}.` })
		.int({ error: `Enter a whole number from ${min} to ${max}.` })
		.min(min, { error: `Enter a whole number from ${min} to ${max}.` })
		.max(max, { error: `Enter a whole number from ${min} to ${max}.` });

export const loadItemSchema = z
	.strictObject({
		id: id.describe('Unique among items; placements refer to it.'),
		label: z.string().max(200, { error: 'Keep the label to 200 characters.' }),
		lengthMm: mm('Length'),
		widthMm: mm('Width'),
		heightMm: mm('Height (vertical when the item stands this way up)'),
		weightKg: kg('Gross mass of one piece'),
		count: wholeNumber(1, API_MAX_PIECES).describe('Pieces of this type.'),
		orientations: z
			.union(
				[
					z.enum(['any', 'thisWayUp']),
					z.strictObject({ lengthUp: z.boolean(), widthUp: z.boolean(), heightUp: z.boolean() })
				],
				{ error: 'Enter "any", "thisWayUp" or { lengthUp, widthUp, heightUp } as true/false.' }
			)
			.describe(
				'"any": all six orientations; "thisWayUp": height stays vertical; or which dimensions may stand vertical.'
			),
		stackable: z.boolean().optional().describe('false: nothing may rest on it. Default true.'),
		maxLoadOnTopKg: kg('Largest mass it may carry above it').optional()
	})
	.describe('One kind of piece: a carton or a loaded pallet, and how many.');

export const loadContainerSchema = z
	.strictObject({
		id: id.describe('Unique among containers.'),
		code: z.string().max(20).optional().describe('Display code, e.g. the ISO 6346 size-type.'),
		lengthMm: mm('Internal length'),
		widthMm: mm('Internal width'),
		heightMm: mm('Internal height'),
		doorWidthMm: mm('Door opening width'),
		doorHeightMm: mm('Door opening height'),
		maxPayloadKg: kg('Largest payload').refine((v) => /[1-9]/.test(v), {
			error: MESSAGES.positiveDecimal
		})
	})
	.describe('A candidate container type (as many of each as needed).');

export const loadPlanInputSchema = z
	.strictObject({
		items: z
			.array(loadItemSchema)
			.min(1, { error: 'Enter at least one item type.' })
			.max(500, { error: 'At most 500 item types.' }),
		containers: z
			.array(loadContainerSchema)
			.min(1, { error: 'Enter at least one container type.' })
			.max(20, { error: 'At most 20 container types.' }),
		options: z
			.strictObject({
				supportShare: z
					.number({ error: 'Enter a share above 0 and at most 1.' })
					.gt(0, { error: 'Enter a share above 0 and at most 1.' })
					.max(1, { error: 'Enter a share above 0 and at most 1.' })
					.optional()
					.describe('Share of each base that must rest on the floor or items below. Default 1.'),
				objective: z.enum(['fewest', 'cheapest']).optional(),
				rates: z
					.record(z.string(), kg('Cost of one container').describe('Cost of one container.'))
					.optional()
					.describe('Cost per container type id (one currency), for "cheapest".'),
				timeBudgetMs: wholeNumber(1, API_MAX_TIME_BUDGET_MS)
					.optional()
					.describe('Search time; the best plan so far is returned. Default 3000.'),
				seed: z.number().int().optional().describe('Tie-break seed. Default 1.'),
				maxContainers: wholeNumber(1, 100).optional().describe('Default 100.')
			})
			.optional()
	})
	.superRefine((input, ctx) => {
		const pieces = input.items.reduce((n, item) => n + item.count, 0);
		if (pieces > API_MAX_PIECES) {
			ctx.addIssue({
				code: 'custom',
				path: ['items'],
				message: `At most ${API_MAX_PIECES} pieces per request; this one has ${pieces}.`
			});
		}
	})
	.describe('Items and candidate containers to plan, and how.');

const int = z.number().int();
const share = z.string().describe('Share with 4 decimals, e.g. "0.9312".');

export const loadPlanSchema = z
	.object({
		containers: z.array(
			z.object({
				index: int.describe('1-based, in loading order.'),
				containerTypeId: z.string(),
				placements: z
					.array(
						z.object({
							itemTypeId: z.string(),
							x: int.describe('From the front wall towards the door, mm.'),
							y: int.describe('From the left wall (seen from the door), mm.'),
							z: int.describe('Up from the floor, mm.'),
							lengthMm: int,
							widthMm: int,
							heightMm: int,
							orientation: z.enum(['LWH', 'WLH', 'LHW', 'HLW', 'WHL', 'HWL'])
						})
					)
					.describe('In a feasible loading order.'),
				pieces: int,
				loadedVolumeM3: z.string(),
				volumeUtilisation: share,
				payloadKg: z.string(),
				payloadUtilisation: share,
				centreOfGravity: z
					.object({
						xMm: z.number(),
						yMm: z.number(),
						zMm: z.number(),
						longitudinalOffsetMm: z.number(),
						transverseOffsetMm: z.number(),
						longitudinalOffsetShare: share,
						transverseOffsetShare: share
					})
					.nullable(),
				warnings: z.array(z.string()).describe('Centre of gravity beyond the CTU Code guidance.')
			})
		),
		containerCounts: z.array(z.object({ containerTypeId: z.string(), count: int })),
		totalCost: z.string().nullable(),
		unplaced: z.array(z.object({ itemTypeId: z.string(), count: int, reason: z.string() })),
		search: z.object({
			elapsedMs: int,
			stoppedBy: z
				.enum(['complete', 'work', 'time'])
				.describe(
					"'work': the work budget ended the search (the same plan on any machine); " +
						"'time': the wall-clock safety stop did (best so far)."
				),
			timeBudgetMs: int,
			workBudget: int.optional(),
			workUsed: int.optional(),
			seed: int
		})
	})
	.describe('Which containers, how each is stowed, and what did not fit.');

export type LoadPlanInputBody = z.infer<typeof loadPlanInputSchema>;
