import { describe, it, expect } from 'vitest';
import {
	TAX_IDENTIFIER_CODES,
	isTaxIdentifierCode,
	taxIdentifierLabel,
	taxIdentifierOptions,
	taxIdentifierType,
	taxIdentifierTypeSchema,
	taxIdentifierTypes
} from './tax-identifiers';

describe('tax identifier types', () => {
	it('has every code once', () => {
		expect(taxIdentifierTypes.map((t) => t.code)).toEqual([...TAX_IDENTIFIER_CODES]);
		expect(isTaxIdentifierCode('EORI')).toBe(true);
		expect(isTaxIdentifierCode('eori')).toBe(false);
		expect(taxIdentifierType('NOPE')).toBeUndefined();
	});

	it('cites the Union Customs Code for EORI', () => {
		// Regulation (EU) No 952/2013 (Union Customs Code), Art. 9 "Registration":
		// economic operators established in the customs territory of the Union register
		// with the customs authorities where they are established (checked).
		const eori = taxIdentifierType('EORI');
		expect(eori?.region).toBe('EU');
		expect(eori?.source).toMatchObject({
			basis: 'checked',
			document: expect.stringContaining('952/2013'),
			section: expect.stringContaining('Art. 9'),
			year: 2013
		});
	});

	it('cites the VAT Directive for EU VAT numbers', () => {
		// Council Directive 2006/112/EC, Art. 215: VAT identification numbers carry the
		// issuing state's ISO 3166 alpha-2 prefix; Greece may use "EL" (checked).
		const vat = taxIdentifierType('VAT');
		expect(vat?.source).toMatchObject({ document: expect.stringContaining('2006/112/EC') });
		expect(vat?.note).toContain('"EL"');
	});

	it.each([
		['UK_VAT', 'GB'],
		['EIN', 'US'],
		['ABN', 'AU'],
		['GST_HST', 'CA'],
		['SST', 'MY'],
		['MST', 'VN']
	])('%s belongs to %s', (code, country) => {
		expect(taxIdentifierType(code)?.country).toBe(country);
	});

	it('marks the generic types as common practice', () => {
		expect(taxIdentifierType('TIN')?.source).toEqual({ basis: 'common practice' });
		expect(taxIdentifierType('OTHER')?.source).toEqual({ basis: 'common practice' });
	});

	it('rejects bad records', () => {
		const ein = taxIdentifierType('EIN');
		expect(() => taxIdentifierTypeSchema.parse({ ...ein, country: 'XK' })).toThrow();
		expect(() => taxIdentifierTypeSchema.parse({ ...ein, region: 'EU' })).toThrow(/not both/);
		expect(() =>
			taxIdentifierTypeSchema.parse({ ...ein, source: { basis: 'from memory' } })
		).toThrow();
	});

	it('gives labels and options for display', () => {
		expect(taxIdentifierLabel('EIN')).toBe('Employer Identification Number (EIN)');
		expect(taxIdentifierLabel('LEGACY_X')).toBe('LEGACY_X');
		expect(taxIdentifierOptions().map((o) => o.code)).toEqual([...TAX_IDENTIFIER_CODES]);
		expect(taxIdentifierOptions()[0]).toEqual({ code: 'EORI', label: 'EORI number' });
	});

	it('uses codes the organization_tax_ids.type column accepts', () => {
		// Landfall's own rule: migrations/20261201-001-organizations.ts CHECK constraint.
		for (const code of TAX_IDENTIFIER_CODES) expect(code).toMatch(/^[A-Z0-9_]{2,20}$/);
	});
});
