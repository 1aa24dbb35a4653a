/**
 * Checks a load-plan input field by field, so a caller (form, API, worker) gets every problem
 * with its path instead of a throw. An empty list means planLoad can run.
 */
import {
	MESSAGES,
	checkMillimetres,
	isDecimalString,
	isPositiveDecimalString,
	isPositiveInt,
	type Problem
} from '../packing/problem';
import { WORK_PER_MS } from './work-budget';

/** Most pieces one plan takes (the search is sized for shipments, not warehouses). */
export const MAX_PIECES = 20_000;
export const MAX_TIME_BUDGET_MS = 600_000;
export const MAX_CONTAINERS = 1_000;
/** Largest work budget: MAX_TIME_BUDGET_MS worth of work (see work-budget.ts). */
export const MAX_WORK_BUDGET = MAX_TIME_BUDGET_MS * WORK_PER_MS;

const ITEM_MM = ['lengthMm', 'widthMm', 'heightMm'] as const;
const CONTAINER_MM = ['lengthMm', 'widthMm', 'heightMm', 'doorWidthMm', 'doorHeightMm'] as const;

function isRecord(v: unknown): v is Record<string, unknown> {
	return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function checkId(
	v: Record<string, unknown>,
	path: string,
	seen: Set<string>,
	problems: Problem[]
): void {
	if (typeof v.id !== 'string' || v.id.trim() === '' || v.id.length > 100) {
		problems.push({ path: `${path}.id`, message: 'Enter an id of 1 to 100 characters.' });
	} else if (seen.has(v.id)) {
		problems.push({ path: `${path}.id`, message: `The id "${v.id}" is used twice.` });
	} else seen.add(v.id);
}

function checkOrientations(v: unknown, path: string, problems: Problem[]): void {
	if (v === 'any' || v === 'thisWayUp') return;
	if (isRecord(v)) {
		const flags = [v.lengthUp, v.widthUp, v.heightUp];
		if (flags.every((f) => typeof f === 'boolean')) {
			if (flags.some((f) => f)) return;
			problems.push({ path, message: 'Allow at least one dimension to stand vertical.' });
			return;
		}
	}
	problems.push({
		path,
		message: 'Enter "any", "thisWayUp" or { lengthUp, widthUp, heightUp } as true/false.'
	});
}

function checkItem(v: unknown, path: string, seen: Set<string>, problems: Problem[]): number {
	if (!isRecord(v)) {
		problems.push({ path, message: 'Enter an item type.' });
		return 0;
	}
	checkId(v, path, seen, problems);
	if (typeof v.label !== 'string' || v.label.length > 200) {
		problems.push({ path: `${path}.label`, message: 'Enter a label of up to 200 characters.' });
	}
	checkMillimetres(v, ITEM_MM, problems, path);
	if (!isDecimalString(v.weightKg)) {
		problems.push({ path: `${path}.weightKg`, message: MESSAGES.decimal });
	}
	if (!isPositiveInt(v.count, MAX_PIECES)) {
		problems.push({
			path: `${path}.count`,
			message: `Enter a whole number of pieces from 1 to ${MAX_PIECES}.`
		});
	}
	checkOrientations(v.orientations, `${path}.orientations`, problems);
	if (v.stackable !== undefined && typeof v.stackable !== 'boolean') {
		problems.push({ path: `${path}.stackable`, message: 'Enter true or false.' });
	}
	if (v.maxLoadOnTopKg !== undefined && !isDecimalString(v.maxLoadOnTopKg)) {
		problems.push({ path: `${path}.maxLoadOnTopKg`, message: MESSAGES.decimal });
	}
	return isPositiveInt(v.count, MAX_PIECES) ? v.count : 0;
}

function checkContainer(v: unknown, path: string, seen: Set<string>, problems: Problem[]): void {
	if (!isRecord(v)) {
		problems.push({ path, message: 'Enter a container type.' });
		return;
	}
	checkId(v, path, seen, problems);
	if (v.code !== undefined && (typeof v.code !== 'string' || v.code.length > 20)) {
		problems.push({ path: `${path}.code`, message: 'Enter a code of up to 20 characters.' });
	}
	checkMillimetres(v, CONTAINER_MM, problems, path);
	if (!isPositiveDecimalString(v.maxPayloadKg)) {
		problems.push({ path: `${path}.maxPayloadKg`, message: MESSAGES.positiveDecimal });
	}
}

function checkOptions(v: unknown, containerIds: string[], problems: Problem[]): void {
	if (v === undefined) return;
	if (!isRecord(v)) {
		problems.push({ path: 'options', message: 'Enter the options as an object.' });
		return;
	}
	const s = v.supportShare;
	if (s !== undefined && !(typeof s === 'number' && s > 0 && s <= 1)) {
		problems.push({
			path: 'options.supportShare',
			message: 'Enter a share above 0 and at most 1 (1 = the whole base supported).'
		});
	}
	if (v.objective !== undefined && v.objective !== 'fewest' && v.objective !== 'cheapest') {
		problems.push({ path: 'options.objective', message: 'Enter "fewest" or "cheapest".' });
	}
	if (v.rates !== undefined && !isRecord(v.rates)) {
		problems.push({
			path: 'options.rates',
			message: 'Enter the rates as { containerTypeId: "cost" }.'
		});
	} else if (isRecord(v.rates)) {
		for (const [id, rate] of Object.entries(v.rates)) {
			if (!isDecimalString(rate)) {
				problems.push({
					path: `options.rates.${id}`,
					message: 'Enter a cost such as "1850.00" (no sign, up to 6 decimals).'
				});
			}
		}
	}
	if (v.objective === 'cheapest') {
		const rates = isRecord(v.rates) ? v.rates : {};
		for (const id of containerIds) {
			if (rates[id] === undefined) {
				problems.push({
					path: `options.rates.${id}`,
					message: 'Enter a rate for every candidate container type to choose the cheapest.'
				});
			}
		}
	}
	if (v.timeBudgetMs !== undefined && !isPositiveInt(v.timeBudgetMs, MAX_TIME_BUDGET_MS)) {
		problems.push({
			path: 'options.timeBudgetMs',
			message: `Enter a whole number of milliseconds from 1 to ${MAX_TIME_BUDGET_MS}.`
		});
	}
	if (v.workBudget !== undefined && !isPositiveInt(v.workBudget, MAX_WORK_BUDGET)) {
		problems.push({
			path: 'options.workBudget',
			message: `Enter a whole number of work units from 1 to ${MAX_WORK_BUDGET}.`
		});
	}
	if (v.stowAt !== undefined && v.stowAt !== 'balanced' && v.stowAt !== 'frontWall') {
		problems.push({ path: 'options.stowAt', message: "Choose 'balanced' or 'frontWall'." });
	}
	if (v.seed !== undefined && !(typeof v.seed === 'number' && Number.isSafeInteger(v.seed))) {
		problems.push({ path: 'options.seed', message: 'Enter a whole number.' });
	}
	if (v.maxContainers !== undefined && !isPositiveInt(v.maxContainers, MAX_CONTAINERS)) {
		problems.push({
			path: 'options.maxContainers',
			message: `Enter a whole number from 1 to ${MAX_CONTAINERS}.`
		});
	}
	if (v.onProgress !== undefined && typeof v.onProgress !== 'function') {
		problems.push({ path: 'options.onProgress', message: 'Pass a function or nothing.' });
	}
}

/** Every problem of `input` (unknown: it may come straight from JSON). */
export function validateLoadInput(input: unknown): Problem[] {
	const problems: Problem[] = [];
	if (!isRecord(input)) return [{ path: '', message: 'Enter items and containers.' }];
	const ids = new Set<string>();
	let pieces = 0;
	if (!Array.isArray(input.items) || input.items.length === 0) {
		problems.push({ path: 'items', message: 'Enter at least one item type.' });
	} else {
		input.items.forEach((item, i) => (pieces += checkItem(item, `items.${i}`, ids, problems)));
		if (pieces > MAX_PIECES) {
			problems.push({
				path: 'items',
				message: `At most ${MAX_PIECES} pieces per plan; this input has ${pieces}.`
			});
		}
	}
	const containerIds = new Set<string>();
	if (!Array.isArray(input.containers) || input.containers.length === 0) {
		problems.push({ path: 'containers', message: 'Enter at least one container type.' });
	} else {
		input.containers.forEach((c, i) =>
			checkContainer(c, `containers.${i}`, containerIds, problems)
		);
	}
	checkOptions(input.options, [...containerIds], problems);
	return problems;
}
