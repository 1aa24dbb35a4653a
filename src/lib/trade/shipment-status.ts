/**
 * The shipment life cycle as data, and the modes of transport Landfall plans for.
 *
 * Rules (Landfall's own):
 * - forward one step at a time: draft → booked → documents_issued → in_transit → arrived →
 *   cleared → delivered;
 * - cancel only before the goods move: from draft, booked or documents_issued;
 * - one step back only to correct data: booked → draft, documents_issued → booked (the
 *   documents are then issued again);
 * - delivered and cancelled are final.
 *
 * Pure module: no framework imports.
 */

/** The main line, in order. */
export const SHIPMENT_FLOW = [
	'draft',
	'booked',
	'documents_issued',
	'in_transit',
	'arrived',
	'cleared',
	'delivered'
] as const;

export const SHIPMENT_STATUSES = [...SHIPMENT_FLOW, 'cancelled'] as const;
export type ShipmentStatus = (typeof SHIPMENT_STATUSES)[number];

export const FINAL_STATUSES: readonly ShipmentStatus[] = Object.freeze(['delivered', 'cancelled']);

export const SHIPMENT_STATUS_LABELS: Readonly<Record<ShipmentStatus, string>> = Object.freeze({
	draft: 'Draft',
	booked: 'Booked',
	documents_issued: 'Documents issued',
	in_transit: 'On the way',
	arrived: 'Arrived',
	cleared: 'Cleared customs',
	delivered: 'Delivered',
	cancelled: 'Cancelled'
});

const CANCELLABLE: ReadonlySet<ShipmentStatus> = new Set(['draft', 'booked', 'documents_issued']);

/** The only steps back, each to correct data before the goods move. */
const STEPS_BACK: Readonly<Partial<Record<ShipmentStatus, ShipmentStatus>>> = Object.freeze({
	booked: 'draft',
	documents_issued: 'booked'
});

export type TransitionKind = 'forward' | 'back' | 'cancel';

const TRANSITIONS: Readonly<Record<ShipmentStatus, readonly ShipmentStatus[]>> = (() => {
	const table = {} as Record<ShipmentStatus, readonly ShipmentStatus[]>;
	for (const status of SHIPMENT_STATUSES) {
		const next: ShipmentStatus[] = [];
		const index = (SHIPMENT_FLOW as readonly ShipmentStatus[]).indexOf(status);
		const forward = index >= 0 ? SHIPMENT_FLOW[index + 1] : undefined;
		if (forward !== undefined) next.push(forward);
		const back = STEPS_BACK[status];
		if (back !== undefined) next.push(back);
		if (CANCELLABLE.has(status)) next.push('cancelled');
		table[status] = Object.freeze(next);
	}
	return Object.freeze(table);
})();

export function isShipmentStatus(value: unknown): value is ShipmentStatus {
	return typeof value === 'string' && (SHIPMENT_STATUSES as readonly string[]).includes(value);
}

export function isFinalStatus(status: ShipmentStatus): boolean {
	return FINAL_STATUSES.includes(status);
}

export function shipmentStatusLabel(status: ShipmentStatus): string {
	return SHIPMENT_STATUS_LABELS[status];
}

/** Where a shipment may go from `status`: the next step first, then a step back, then cancel. */
export function allowedTransitions(status: ShipmentStatus): readonly ShipmentStatus[] {
	return TRANSITIONS[status];
}

/** True when a shipment may move from `from` to `to` in one step. */
export function canTransition(from: ShipmentStatus, to: ShipmentStatus): boolean {
	return TRANSITIONS[from].includes(to);
}

/** What kind of step `from` → `to` is, or undefined when it is not allowed. */
export function transitionKind(
	from: ShipmentStatus,
	to: ShipmentStatus
): TransitionKind | undefined {
	if (!canTransition(from, to)) return undefined;
	if (to === 'cancelled') return 'cancel';
	return STEPS_BACK[from] === to ? 'back' : 'forward';
}

/** `{ value, label }` pairs in life-cycle order, for filters and select inputs. */
export function shipmentStatusOptions(): readonly {
	readonly value: ShipmentStatus;
	readonly label: string;
}[] {
	return SHIPMENT_STATUSES.map((value) =>
		Object.freeze({ value, label: SHIPMENT_STATUS_LABELS[value] })
	);
}

export const TRANSPORT_MODES = ['air', 'sea_fcl', 'sea_lcl', 'road', 'courier'] as const;
export type TransportMode = (typeof TRANSPORT_MODES)[number];

/** FCL: full container load; LCL: less than container load, i.e. groupage (common practice). */
export const TRANSPORT_MODE_LABELS: Readonly<Record<TransportMode, string>> = Object.freeze({
	air: 'Air',
	sea_fcl: 'Sea, full container',
	sea_lcl: 'Sea, groupage',
	road: 'Road',
	courier: 'Courier'
});

export function isTransportMode(value: unknown): value is TransportMode {
	return typeof value === 'string' && (TRANSPORT_MODES as readonly string[]).includes(value);
}

export function transportModeLabel(mode: TransportMode): string {
	return TRANSPORT_MODE_LABELS[mode];
}

/** True for the modes that travel by sea (FCL and LCL). */
export function isSeaMode(mode: TransportMode): boolean {
	return mode === 'sea_fcl' || mode === 'sea_lcl';
}

/** `{ value, label }` pairs in list order, for select inputs. */
export function transportModeOptions(): readonly {
	readonly value: TransportMode;
	readonly label: string;
}[] {
	return TRANSPORT_MODES.map((value) =>
		Object.freeze({ value, label: TRANSPORT_MODE_LABELS[value] })
	);
}
