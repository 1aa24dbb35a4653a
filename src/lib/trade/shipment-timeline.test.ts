import { describe, expect, it } from 'vitest';
import { shipmentTimeline, type TimelineInput } from './shipment-timeline';

// Landfall's own presentation rules (no outside source: the life cycle is ours).
const base: TimelineInput = {
	status: 'booked',
	events: [
		{ toStatus: 'draft', occurredAt: '2026-11-20T08:00:00.000Z' },
		{ toStatus: 'booked', occurredAt: '2026-11-21T09:30:00.000Z' }
	],
	etd: '2026-12-11',
	eta: '2027-01-14',
	today: '2026-12-02'
};

const states = (input: TimelineInput) =>
	shipmentTimeline(input).milestones.map((m) => `${m.status}:${m.state}`);

describe('shipmentTimeline', () => {
	it('marks the steps taken, the next one and those after it', () => {
		expect(states(base)).toEqual([
			'booked:done',
			'documents_issued:next',
			'in_transit:upcoming',
			'arrived:upcoming',
			'cleared:upcoming',
			'delivered:upcoming'
		]);
		const t = shipmentTimeline(base);
		expect(t.milestones[0]!.reachedAt).toBe('2026-11-21T09:30:00.000Z');
		expect(t.milestones[2]!.planned).toBe('2026-12-11');
		expect(t.milestones[3]!.planned).toBe('2027-01-14');
		expect(t.cancelled).toBeNull();
	});

	it('a draft has no step taken and booking next', () => {
		expect(states({ ...base, status: 'draft', events: [base.events[0]!] })[0]).toBe('booked:next');
	});

	it('flags a planned departure that passed without the shipment leaving', () => {
		const t = shipmentTimeline({ ...base, today: '2026-12-12' });
		expect(t.milestones[2]).toMatchObject({ status: 'in_transit', overdue: true });
		expect(t.milestones[3]).toMatchObject({ status: 'arrived', overdue: false });
		const left = shipmentTimeline({
			...base,
			status: 'in_transit',
			events: [...base.events, { toStatus: 'in_transit', occurredAt: '2026-12-12T06:00:00Z' }],
			today: '2026-12-13'
		});
		expect(left.milestones[2]).toMatchObject({ state: 'done', overdue: false });
	});

	it('after a step back, later steps are open again and the retake time counts', () => {
		const t = shipmentTimeline({
			...base,
			status: 'documents_issued',
			events: [
				...base.events,
				{ toStatus: 'documents_issued', occurredAt: '2026-11-22T10:00:00Z' },
				{ toStatus: 'booked', occurredAt: '2026-11-23T10:00:00Z' },
				{ toStatus: 'documents_issued', occurredAt: '2026-11-24T10:00:00Z' }
			]
		});
		expect(t.milestones[1]).toMatchObject({ state: 'done', reachedAt: '2026-11-24T10:00:00Z' });
		const back = shipmentTimeline({
			...base,
			events: [
				...base.events,
				{ toStatus: 'documents_issued', occurredAt: '2026-11-22T10:00:00Z' },
				{ toStatus: 'booked', occurredAt: '2026-11-23T10:00:00Z' }
			]
		});
		expect(back.milestones[1]).toMatchObject({ state: 'next', reachedAt: null });
	});

	it('a cancelled shipment keeps the steps it took and stops the rest', () => {
		const t = shipmentTimeline({
			...base,
			status: 'cancelled',
			events: [
				...base.events,
				{ toStatus: 'cancelled', occurredAt: '2026-11-25T12:00:00Z', note: 'Order withdrawn' }
			],
			today: '2027-02-01'
		});
		expect(t.milestones.map((m) => m.state)).toEqual([
			'done',
			'stopped',
			'stopped',
			'stopped',
			'stopped',
			'stopped'
		]);
		expect(t.milestones.some((m) => m.overdue)).toBe(false);
		expect(t.cancelled).toEqual({ at: '2026-11-25T12:00:00Z', note: 'Order withdrawn' });
	});
});
