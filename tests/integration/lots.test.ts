// Traceability: lots and serial ranges per carton range, and the "where did serial X go?" search.
import { describe, expect, it } from 'vitest';
import { traceSerial } from '$lib/server/services/shipment-lots';
import { lotSchema } from '$lib/schemas/shipments';
import './db';
import { sessionUserFor } from './db';

describe('serial trace', () => {
	it('finds the demo Hallvik shipment, its cartons and customer for a serial inside a range', async () => {
		const coordinator = await sessionUserFor('coordinator@solvrae.example');
		const hits = await traceSerial(coordinator, 'PB20-000800');
		const hit = hits.find((h) => h.customerName.startsWith('Hallvik'));
		expect(hit).toMatchObject({
			lotNumber: 'PB20-2611-B',
			cartonFrom: 61,
			cartonTo: 120,
			sku: 'SLV-PBL-20'
		});
		expect(await traceSerial(coordinator, 'PB20-999999')).toEqual([]);
		// Same text, other length: not inside the range (ranges compare as equal-length text).
		expect(await traceSerial(coordinator, 'PB20-0008')).toEqual([]);
		// A lot number works too, in any letter case.
		expect((await traceSerial(coordinator, 'pb20-2611-a')).length).toBeGreaterThan(0);
	});

	it('never shows one customer another customer’s shipments', async () => {
		const other = await sessionUserFor('buyer@wattlebird.example');
		expect(await traceSerial(other, 'PB20-000800')).toEqual([]);
		const own = await sessionUserFor('buyer@hallvik.example');
		expect((await traceSerial(own, 'PB20-000800')).length).toBeGreaterThan(0);
	});

	it('refuses half or reversed serial ranges and reversed carton ranges', () => {
		const base = {
			productId: crypto.randomUUID(),
			cartonFrom: 1,
			cartonTo: 5,
			lotNumber: 'L1',
			version: 0
		};
		expect(lotSchema.safeParse({ ...base, serialFrom: 'A001' }).success).toBe(false);
		expect(lotSchema.safeParse({ ...base, serialFrom: 'A009', serialTo: 'A001' }).success).toBe(
			false
		);
		expect(lotSchema.safeParse({ ...base, serialFrom: 'A1', serialTo: 'A100' }).success).toBe(
			false
		);
		expect(lotSchema.safeParse({ ...base, cartonFrom: 6 }).success).toBe(false);
		expect(lotSchema.safeParse({ ...base, serialFrom: 'A001', serialTo: 'A100' }).success).toBe(
			true
		);
	});
});
