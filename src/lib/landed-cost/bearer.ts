/**
 * Who bears each cost under an Incoterms® 2020 rule (ICC, Incoterms 2020, A9/B9 "Allocation of
 * costs" with A4 carriage, A5 insurance and A7/B7 export and import clearance; from memory):
 * - goods: the buyer pays the price.
 * - origin charges (export clearance, handling to the carrier): the seller, except under EXW.
 * - main freight: the buyer under E and F rules, the seller under C and D rules.
 * - insurance: the seller under CIF and CIP (obliged to insure) and under D rules (the seller
 *   carries the risk to the destination); otherwise the buyer, who carries the risk in transit.
 * - duty, import VAT/GST, customs fees and brokerage (import clearance): the buyer, except DDP.
 * - destination charges (terminal handling and delivery at destination): the seller under D
 *   rules, the buyer otherwise (common practice: the sales contract and the carriage contract
 *   may say otherwise, e.g. destination terminal handling included in a C-rule freight).
 */
import { incotermObligations } from '../trade/incoterm-obligations';
import type { IncotermCode } from '../trade/incoterms';
import type { CostKey, Party } from './types';

/** Read from the Incoterms obligations table (`trade/incoterm-obligations.ts`). */
export function bearer(key: CostKey, rule: IncotermCode): Party {
	const o = incotermObligations(rule);
	switch (key) {
		case 'goods':
			return 'buyer';
		case 'originCharges':
			return o.exportClearance;
		case 'freight':
			return o.mainCarriage;
		case 'insurance':
			return o.insuranceDuty !== 'none' || o.riskPassesAtDestination ? 'seller' : 'buyer';
		case 'duty':
		case 'vat':
			return o.importDuty;
		case 'fees':
		case 'brokerage':
			return o.importClearance;
		case 'destinationCharges':
			return o.family === 'D' ? 'seller' : 'buyer';
	}
}
