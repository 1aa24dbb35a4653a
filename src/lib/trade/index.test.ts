import { describe, it, expect } from 'vitest';
import * as trade from './index';

describe('trade index', () => {
	it('re-exports every module', () => {
		expect(trade.validateContainerNumber('CSQU3054383').ok).toBe(true);
		expect(trade.formatHsCode('85182200')).toBe('8518.22.00');
		expect(trade.validateLocationCode('MY PEN').ok).toBe(true);
		expect(trade.canTransition('draft', 'booked')).toBe(true);
		expect(trade.isIncoterm('FOB')).toBe(true);
	});

	it('exports these names', () => {
		expect(Object.keys(trade).sort()).toEqual(
			[
				// iso6346
				'CHECK_DIGIT_LETTER_VALUES',
				'EQUIPMENT_CATEGORIES',
				'EQUIPMENT_CATEGORY_LABELS',
				'containerCheckDigit',
				'formatContainerNumber',
				'isContainerNumber',
				'isEquipmentCategory',
				'normalizeContainerInput',
				'parseContainerNumber',
				'validateContainerNumber',
				// hs-code
				'HS_CODE_LENGTHS',
				'RESERVED_HS_CHAPTER',
				'formatHsCode',
				'hsParts',
				'isHsCode',
				'normalizeHsCode',
				'validateHsCode',
				// unlocode
				'PLACE_KINDS',
				'PLACE_KIND_LABELS',
				'PLACE_KIND_UNLOCODE_FUNCTION',
				'formatLocationCode',
				'isLocationCode',
				'isPlaceKind',
				'normalizeLocationCode',
				'placeKindLabel',
				'placeKindOptions',
				'validateLocationCode',
				// shipment-status
				'FINAL_STATUSES',
				'SHIPMENT_FLOW',
				'SHIPMENT_STATUSES',
				'SHIPMENT_STATUS_LABELS',
				'TRANSPORT_MODES',
				'TRANSPORT_MODE_LABELS',
				'allowedTransitions',
				'canTransition',
				'isFinalStatus',
				'isSeaMode',
				'isShipmentStatus',
				'isTransportMode',
				'shipmentStatusLabel',
				'shipmentStatusOptions',
				'transitionKind',
				'transportModeLabel',
				'transportModeOptions',
				// incoterms
				'INCOTERMS_2020',
				'INCOTERMS_EDITION',
				'INCOTERM_CODES',
				'formatIncotermWithPlace',
				'incoterm',
				'isIncoterm',
				// incoterm-obligations, incoterm-costs, incoterm-checks, responsibility-matrix
				'INCOTERM_OBLIGATIONS',
				'INCOTERM_OBLIGATIONS_SOURCE',
				'INSURANCE_DUTY_TEXT',
				'incotermObligations',
				'incotermCosts',
				'ANY_MODE_EQUIVALENT',
				'incotermChecks',
				'RESPONSIBILITY_LABELS',
				'responsibilityMatrix'
			].sort()
		);
	});
});
