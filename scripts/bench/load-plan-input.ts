// A small, realistic body for POST /api/v1/calc/load-plan: one shipment's three carton types
// (invented: speakers, sensors, power banks; about 240 cartons) into 20 ft and 40 ft general-
// purpose containers taken from the reference list, with a short search budget, as a
// coordinator's "what if" request would send.
import type { LoadPlanInputBody } from '../../src/lib/schemas/load-plan';
import { containerType } from '../../src/lib/reference/equipment';

/** Search budget of the request (ms of calibrated work, so the same plan on any machine). */
export const CALC_LOAD_PLAN_BUDGET_MS = 200;

function container(code: 'C20GP' | 'C40GP') {
	const type = containerType(code);
	if (!type) throw new Error(`container type ${code} missing from the reference list`);
	return {
		id: code,
		code: type.iso6346SizeType,
		lengthMm: type.internal.lengthMm,
		widthMm: type.internal.widthMm,
		heightMm: type.internal.heightMm,
		doorWidthMm: type.doorOpening.widthMm,
		doorHeightMm: type.doorOpening.heightMm,
		maxPayloadKg: type.maxPayloadKg
	};
}

export function calcLoadPlanBody(): LoadPlanInputBody {
	return {
		items: [
			{
				id: 'SPK-200',
				label: 'Bookshelf speaker pair',
				lengthMm: 620,
				widthMm: 410,
				heightMm: 380,
				weightKg: '14.6',
				count: 96,
				orientations: 'thisWayUp'
			},
			{
				id: 'SNS-040',
				label: 'Door sensor, 48 per carton',
				lengthMm: 400,
				widthMm: 300,
				heightMm: 250,
				weightKg: '6.2',
				count: 84,
				orientations: 'any'
			},
			{
				id: 'PWR-120',
				label: 'Power bank, 24 per carton',
				lengthMm: 480,
				widthMm: 320,
				heightMm: 300,
				weightKg: '11.8',
				count: 60,
				orientations: 'thisWayUp',
				maxLoadOnTopKg: '60'
			}
		],
		containers: [container('C20GP'), container('C40GP')],
		options: { timeBudgetMs: CALC_LOAD_PLAN_BUDGET_MS, seed: 1 }
	};
}
