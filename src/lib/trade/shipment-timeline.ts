/**
 * A shipment's journey as milestones for the people waiting on it: what has happened (with the
 * time it happened), what is next, and the planned dates of departure and arrival, marked overdue
 * when they pass without the step being recorded.
 *
 * Landfall's own presentation of the life cycle in shipment-status.ts. Pure module: no framework
 * imports.
 */
import { SHIPMENT_FLOW, type ShipmentStatus } from './shipment-status';

export type MilestoneState = 'done' | 'next' | 'upcoming' | 'stopped';

export interface Milestone {
	status: Exclude<ShipmentStatus, 'draft' | 'cancelled'>;
	label: string;
	state: MilestoneState;
	/** When the shipment last reached this step (ISO timestamp); only for done steps. */
	reachedAt: string | null;
	/** The planned date (ISO date) for departure and arrival, from the booking's ETD and ETA. */
	planned: string | null;
	/** Planned date before today and the step not yet recorded. */
	overdue: boolean;
}

export interface Timeline {
	milestones: Milestone[];
	/** Set when the shipment was cancelled: when, and the note given. */
	cancelled: { at: string; note: string | null } | null;
}

export interface TimelineInput {
	status: ShipmentStatus;
	events: readonly { toStatus: ShipmentStatus; occurredAt: string; note?: string | null }[];
	etd: string | null;
	eta: string | null;
	/** ISO date the overdue check is made on. */
	today: string;
}

const LABELS: Record<Milestone['status'], string> = {
	booked: 'Booked with the carrier',
	documents_issued: 'Customs papers issued',
	in_transit: 'Departed',
	arrived: 'Arrived at destination',
	cleared: 'Cleared customs',
	delivered: 'Delivered'
};

const STEPS = SHIPMENT_FLOW.filter((s) => s !== 'draft') as Milestone['status'][];

/** The flow step a status stands at; a cancelled shipment stands where it was before. */
function reachedIndex(input: TimelineInput): number {
	if (input.status !== 'cancelled') return STEPS.indexOf(input.status as Milestone['status']);
	for (let i = input.events.length - 1; i >= 0; i--) {
		const to = input.events[i]!.toStatus;
		if (to !== 'cancelled') return STEPS.indexOf(to as Milestone['status']);
	}
	return -1;
}

export function shipmentTimeline(input: TimelineInput): Timeline {
	const reached = reachedIndex(input);
	const stopped = input.status === 'cancelled';
	// The last time each step was reached: a step taken back and again counts from the retake.
	const lastAt = new Map<ShipmentStatus, string>();
	for (const e of input.events) lastAt.set(e.toStatus, e.occurredAt);

	const milestones = STEPS.map((status, i): Milestone => {
		const state: MilestoneState =
			i <= reached ? 'done' : stopped ? 'stopped' : i === reached + 1 ? 'next' : 'upcoming';
		const planned = status === 'in_transit' ? input.etd : status === 'arrived' ? input.eta : null;
		return {
			status,
			label: LABELS[status],
			state,
			reachedAt: state === 'done' ? (lastAt.get(status) ?? null) : null,
			planned,
			overdue: planned !== null && state !== 'done' && !stopped && planned < input.today
		};
	});
	const cancelEvent = stopped
		? [...input.events].reverse().find((e) => e.toStatus === 'cancelled')
		: undefined;
	return {
		milestones,
		cancelled: stopped
			? { at: cancelEvent?.occurredAt ?? '', note: cancelEvent?.note ?? null }
			: null
	};
}
