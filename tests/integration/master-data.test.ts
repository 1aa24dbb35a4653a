// Places and parties: UN/LOCODE-style codes checked against the country, identifiers parsed.
import { describe, expect, it } from 'vitest';
import { parseTaxIdLines, partySchema, placeSchema } from '$lib/schemas/master-data';
import { createParty, createPlace } from '$lib/server/services/master-data';
import { Party, Place } from '$lib/server/db/models';
import { sessionUserFor } from './db';

describe('places', () => {
	it('accepts a code whose country matches and refuses one that does not', () => {
		// UN/LOCODE: ISO 3166-1 alpha-2 country + 3 characters (UNECE UN/LOCODE manual; from memory).
		expect(
			placeSchema.safeParse({ code: 'MY PEN', name: 'Penang', kind: 'seaport', countryCode: 'MY' })
				.success
		).toBe(true);
		const wrong = placeSchema.safeParse({
			code: 'DEHAM',
			name: 'Hamburg',
			kind: 'seaport',
			countryCode: 'NL'
		});
		expect(wrong.success).toBe(false);
		expect(wrong.error?.issues[0]?.path).toEqual(['code']);
	});

	it('stores the code without its space and refuses a duplicate', async () => {
		const admin = await sessionUserFor('admin@solvrae.example');
		const code = `NL${String.fromCharCode(65 + Math.floor(Math.random() * 26))}Q${Math.floor(Math.random() * 8) + 2}`;
		const first = await createPlace(
			admin,
			placeSchema.parse({
				code: `${code.slice(0, 2)} ${code.slice(2)}`,
				name: 'Test quay',
				kind: 'inland',
				countryCode: 'NL'
			}),
			null
		);
		expect(first.ok).toBe(true);
		expect((await Place.findOne({ where: { code } }))?.name).toBe('Test quay');
		const again = await createPlace(
			admin,
			placeSchema.parse({ code, name: 'Again', kind: 'inland', countryCode: 'NL' }),
			null
		);
		expect(again).toMatchObject({
			ok: false,
			fieldErrors: { code: expect.stringContaining('exists') }
		});
		await Place.destroy({ where: { code } });
	});
});

describe('parties', () => {
	it('parses identifiers written one per line as “TYPE: value”', () => {
		expect(parseTaxIdLines('EORI: DE123\n\nvat: DE318204771 ')).toEqual([
			{ type: 'EORI', value: 'DE123' },
			{ type: 'VAT', value: 'DE318204771' }
		]);
		const bad = partySchema.safeParse({
			name: 'X',
			line1: 'Y',
			city: 'Z',
			countryCode: 'DE',
			taxIds: 'just a number'
		});
		expect(bad.error?.issues[0]?.path).toEqual(['taxIds']);
	});

	it('creates a party with its identifiers', async () => {
		const coordinator = await sessionUserFor('coordinator@solvrae.example');
		const name = `Test consignee ${Date.now()}`;
		const result = await createParty(
			coordinator,
			partySchema.parse({
				name,
				line1: '1 Test Street',
				city: 'Bremen',
				countryCode: 'DE',
				taxIds: 'EORI: DE999'
			}),
			null
		);
		expect(result.ok).toBe(true);
		const party = await Party.findOne({ where: { name }, raw: true });
		expect(party?.taxIds).toEqual([{ type: 'EORI', value: 'DE999' }]);
		await Party.destroy({ where: { name } });
	});
});
