import fc from 'fast-check';
import { describe, it, expect } from 'vitest';
import {
	FINAL_STATUSES,
	SHIPMENT_FLOW,
	SHIPMENT_STATUSES,
	SHIPMENT_STATUS_LABELS,
	TRANSPORT_MODES,
	TRANSPORT_MODE_LABELS,
	allowedTransitions,
	canTransition,
	isFinalStatus,
	isSeaMode,
	isShipmentStatus,
	isTransportMode,
	shipmentStatusLabel,
	shipmentStatusOptions,
	transitionKind,
	transportModeLabel,
	transportModeOptions,
	type ShipmentStatus
} from './shipment-status';

// The life cycle is Landfall's own design (see the module comment); these tests pin it down.

describe('shipment statuses', () => {
	it('lists the main line in order, then cancelled', () => {
		expect([...SHIPMENT_STATUSES]).toEqual([
			'draft',
			'booked',
			'documents_issued',
			'in_transit',
			'arrived',
			'cleared',
			'delivered',
			'cancelled'
		]);
		expect([...FINAL_STATUSES]).toEqual(['delivered', 'cancelled']);
	});

	it('labels every status in plain words', () => {
		for (const status of SHIPMENT_STATUSES) {
			expect(shipmentStatusLabel(status)).toBe(SHIPMENT_STATUS_LABELS[status]);
			expect(shipmentStatusLabel(status)).toMatch(/^[A-Z][a-z ]+$/);
		}
		expect(new Set(Object.values(SHIPMENT_STATUS_LABELS)).size).toBe(SHIPMENT_STATUSES.length);
		expect(shipmentStatusOptions().map((o) => o.value)).toEqual([...SHIPMENT_STATUSES]);
		expect(isShipmentStatus('booked')).toBe(true);
		expect(isShipmentStatus('Booked')).toBe(false);
		expect(isShipmentStatus(undefined)).toBe(false);
	});
});

describe('transitions', () => {
	it('has exactly these transitions', () => {
		const table = Object.fromEntries(SHIPMENT_STATUSES.map((s) => [s, [...allowedTransitions(s)]]));
		expect(table).toEqual({
			draft: ['booked', 'cancelled'],
			booked: ['documents_issued', 'draft', 'cancelled'],
			documents_issued: ['in_transit', 'booked', 'cancelled'],
			in_transit: ['arrived'],
			arrived: ['cleared'],
			cleared: ['delivered'],
			delivered: [],
			cancelled: []
		});
	});

	it('goes forward one step at a time', () => {
		for (let i = 0; i < SHIPMENT_FLOW.length; i++) {
			for (let j = 0; j < SHIPMENT_FLOW.length; j++) {
				const from = SHIPMENT_FLOW[i] as ShipmentStatus;
				const to = SHIPMENT_FLOW[j] as ShipmentStatus;
				if (j > i) expect(canTransition(from, to), `${from} → ${to}`).toBe(j === i + 1);
			}
		}
	});

	it('cancels only before the goods move', () => {
		const cancellable = SHIPMENT_STATUSES.filter((s) => canTransition(s, 'cancelled'));
		expect(cancellable).toEqual(['draft', 'booked', 'documents_issued']);
	});

	it('steps back only booked → draft and documents_issued → booked', () => {
		const back: string[] = [];
		for (const from of SHIPMENT_STATUSES) {
			for (const to of allowedTransitions(from)) {
				if (transitionKind(from, to) === 'back') back.push(`${from}→${to}`);
			}
		}
		expect(back).toEqual(['booked→draft', 'documents_issued→booked']);
	});

	it('names each kind of step', () => {
		expect(transitionKind('draft', 'booked')).toBe('forward');
		expect(transitionKind('booked', 'draft')).toBe('back');
		expect(transitionKind('booked', 'cancelled')).toBe('cancel');
		expect(transitionKind('in_transit', 'cancelled')).toBeUndefined();
		expect(transitionKind('draft', 'draft')).toBeUndefined();
	});

	it('agrees between canTransition and allowedTransitions for every pair', () => {
		for (const from of SHIPMENT_STATUSES) {
			for (const to of SHIPMENT_STATUSES) {
				expect(canTransition(from, to)).toBe(allowedTransitions(from).includes(to));
			}
		}
	});

	it('reaches every status from draft', () => {
		const seen = new Set<ShipmentStatus>(['draft']);
		const queue: ShipmentStatus[] = ['draft'];
		for (let current = queue.shift(); current !== undefined; current = queue.shift()) {
			for (const next of allowedTransitions(current)) {
				if (!seen.has(next)) {
					seen.add(next);
					queue.push(next);
				}
			}
		}
		expect([...seen].sort()).toEqual([...SHIPMENT_STATUSES].sort());
	});

	it('has no way out of a final status', () => {
		for (const status of FINAL_STATUSES) {
			expect(isFinalStatus(status)).toBe(true);
			expect(allowedTransitions(status)).toEqual([]);
		}
		for (const status of SHIPMENT_STATUSES.filter((s) => !isFinalStatus(s))) {
			expect(allowedTransitions(status).length, status).toBeGreaterThan(0);
		}
	});

	it('a random walk stays in the status set and never leaves a final status', () => {
		fc.assert(
			fc.property(
				fc.constantFrom(...SHIPMENT_STATUSES),
				fc.array(fc.nat(), { maxLength: 50 }),
				(start, choices) => {
					let current: ShipmentStatus = start;
					for (const choice of choices) {
						const options = allowedTransitions(current);
						if (isFinalStatus(current)) {
							expect(options).toEqual([]);
							break;
						}
						const next = options[choice % options.length];
						expect(next).toBeDefined();
						if (next === undefined) return;
						expect(isShipmentStatus(next)).toBe(true);
						expect(canTransition(current, next)).toBe(true);
						current = next;
					}
					expect(SHIPMENT_STATUSES).toContain(current);
				}
			)
		);
	});
});

describe('transport modes', () => {
	it('has the five modes with their labels', () => {
		// FCL "full container load" and LCL "less than container load" (groupage): common practice.
		expect(TRANSPORT_MODE_LABELS).toEqual({
			air: 'Air',
			sea_fcl: 'Sea, full container',
			sea_lcl: 'Sea, groupage',
			road: 'Road',
			courier: 'Courier'
		});
		expect(transportModeOptions().map((o) => o.value)).toEqual([...TRANSPORT_MODES]);
		for (const mode of TRANSPORT_MODES) {
			expect(transportModeLabel(mode)).toBe(TRANSPORT_MODE_LABELS[mode]);
			expect(isTransportMode(mode)).toBe(true);
		}
		expect(isTransportMode('rail')).toBe(false);
		expect(TRANSPORT_MODES.filter(isSeaMode)).toEqual(['sea_fcl', 'sea_lcl']);
	});
});
