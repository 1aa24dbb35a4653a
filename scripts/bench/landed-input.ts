// The landed-cost engine's input for the benchmarks: a shipment of N invented lines, with a rate
// card per mode (invented figures). bench:landed times the engine on it in process (500 lines);
// npm run bench sends a small one to POST /api/v1/calc/landed-cost.
import {
	baseInput,
	country,
	courierCard,
	line,
	rate,
	tariff
} from '../../src/lib/landed-cost/test-fixtures';
import type { LandedCostInput, RateCard, TransportMode } from '../../src/lib/landed-cost';

// The fields every card shares. The courier's own are blanked: JSON drops them, and the API
// refuses keys a card of another mode does not have.
const common = {
	...courierCard({ currency: 'USD', distanceKm: '6600' }),
	firstHalfKg: undefined,
	additionalHalfKg: undefined
};
const surcharges = [
	{ label: 'Fuel', basis: 'percent_of_freight' as const, amount: '18', currency: 'USD' },
	{ label: 'Security', basis: 'per_chargeable_kg' as const, amount: '0.15', currency: 'USD' }
];
export const LANDED_CARDS: Record<Exclude<TransportMode, 'courier'>, RateCard> = {
	air: {
		...common,
		mode: 'air',
		minimumCharge: '85.00',
		breaks: ['0:5.00', '45:4.20', '100:3.60', '300:3.10', '500:2.60', '1000:2.30'].map((b) => {
			const [fromKg, ratePerKg] = b.split(':') as [string, string];
			return { fromKg, ratePerKg };
		}),
		surcharges
	},
	sea_fcl: {
		...common,
		mode: 'sea_fcl',
		containerRates: [{ typeCode: '45G1', ratePerContainer: '2400.00' }],
		destinationCharges: [
			{ label: 'Terminal handling', basis: 'per_container', amount: '310', currency: 'AUD' }
		]
	},
	sea_lcl: { ...common, mode: 'sea_lcl', ratePerWm: '48.00', minimumWm: '1', minimumCharge: '60' },
	road: { ...common, mode: 'road', basis: 'per_pallet', rate: '95.00', minimumCharge: '150.00' }
};

export function landedBenchInput(
	mode: TransportMode,
	card: RateCard,
	lineCount: number
): LandedCostInput {
	const hs = ['85182200', '85183000', '85171300', '85044090', '85076000'];
	return baseInput({
		mode,
		incoterm: 'FCA',
		goodsCurrency: 'USD',
		reportCurrency: 'AUD',
		allocation: 'weight',
		lines: Array.from({ length: lineCount }, (_, i) =>
			line({
				ref: String(i + 1),
				sku: `SKU-${i + 1}`,
				hsCode: hs[i % hs.length]!,
				quantity: 1 + (i % 37),
				unitPrice: `${10 + (i % 90)}.${String(i % 100).padStart(2, '0')}`,
				netKg: `${1 + (i % 9)}.250`,
				grossKg: `${2 + (i % 9)}.400`
			})
		),
		measures: {
			grossKg: '18400',
			volumeM3: '62.5',
			chargeableKg: mode === 'road' ? '20813' : '18400',
			pallets: 30,
			containers: [{ typeCode: '45G1', count: 1 }]
		},
		rateCard: card,
		tariffRows: [tariff('85', '5'), tariff('8518', '3'), tariff('851822', '2.5')],
		country: country({ fees: [] }),
		exchangeRates: [rate('AUD', 'USD', '0.65')],
		insurance: { ratePercent: '0.35', upliftPercent: '10', minimumPremium: null, source: 'bench' },
		brokerage: [{ label: 'Entry', basis: 'per_shipment', amount: '180.00', currency: 'AUD' }],
		carryingRatePercent: '8',
		emissionFactor: {
			id: 'ef',
			source: 'invented',
			validFrom: '2025-01-01',
			validTo: null,
			gCo2ePerTonneKm: '10'
		}
	});
}
