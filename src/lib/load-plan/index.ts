/**
 * Container load planner (pure TypeScript, no framework imports): will a shipment fit, in how
 * many containers of which types, and exactly how is each stowed. See plan-load.ts for the
 * multi-container choice, search.ts and blocks.ts for the method, validate-plan.ts for the rules
 * every plan keeps.
 */
export { planLoad, DEFAULT_TIME_BUDGET_MS, DEFAULT_MAX_CONTAINERS } from './plan-load';
export { validatePlan, type Violation } from './validate-plan';
export { WORK_PER_MS } from './work-budget';
export { validateLoadInput, MAX_PIECES } from './validate-input';
export { palletItem, type LoadedPallet } from './pallet-item';
export {
	LONGITUDINAL_LIMIT,
	LONGITUDINAL_SPECIAL_LIMIT,
	TRANSVERSE_LIMIT
} from './centre-of-gravity';
export type * from './types';
