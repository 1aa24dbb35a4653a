/**
 * Invented snapshots for the PDF tests and the benchmark. Companies, people, products, numbers
 * and marks are made up (the demo scenario's exporter and customers). Amounts are worked out
 * here with decimal.js, as the snapshot builder would, so the renderer gets exact strings.
 */
import { Decimal } from 'decimal.js';
import type {
	InvoiceLine,
	InvoiceSnapshot,
	PackingListSnapshot,
	PackingRow,
	PrintedParty
} from '../../../documents/types';
import { drawContainer, type PlacedBox } from '../../../load-plan-view/project';
import type { LoadPlanPictureForPdf } from './packing-list-pdf';

const EXPORTER: PrintedParty = {
	name: 'Solvrae Electronics Sdn. Bhd.',
	addressLines: ['18 Jalan Kelisa Emas 4', '11900 Bayan Lepas', 'Pulau Pinang', 'Malaysia'],
	countryCode: 'MY',
	taxIds: [
		{ type: 'SST', value: 'P11-2207-32000418' },
		{ type: 'EORI', value: 'NL863201447' }
	],
	contact: 'Nur Aisyah Rahim · exports@solvrae.example · +60 4 000 1234'
};

const HALLVIK: PrintedParty = {
	name: 'Hallvik Heimtechnik GmbH',
	addressLines: ['Billstraße 211', '20539 Hamburg', 'Germany'],
	countryCode: 'DE',
	taxIds: [
		{ type: 'VAT', value: 'DE318204771' },
		{ type: 'EORI', value: 'DE512778904336921' }
	],
	contact: 'Jonas Petersen · einkauf@hallvik.example'
};

const HALLVIK_DC: PrintedParty = {
	...HALLVIK,
	name: 'Hallvik Heimtechnik GmbH — Distribution centre',
	addressLines: ['Am Lagerfeld 9', '28197 Bremen', 'Germany'],
	contact: null
};

const BROKER: PrintedParty = {
	name: 'Kaaiman Customs Services B.V.',
	addressLines: ['Waalhaven Zuidzijde 40', '3089 JH Rotterdam', 'Netherlands'],
	countryCode: 'NL',
	taxIds: [{ type: 'EORI', value: 'NL812004563' }],
	contact: 'douane@kaaiman.example'
};

/** Demo products: SKU, description, HS code, origin, EUR price, net kg per unit, units/carton. */
const PRODUCTS = [
	[
		'SLV-PBL-20',
		'Pebble 20 portable speaker, rechargeable, blue',
		'8518.22.00',
		'MY',
		'18.40',
		'0.620',
		12
	],
	[
		'SLV-TWR-80',
		'Tower 80 floor-standing speaker pair, mains powered',
		'8518.22.00',
		'MY',
		'212.75',
		'14.800',
		1
	],
	[
		'SLV-SNS-TH1',
		'Nook temperature and humidity sensor, battery powered (coin cell)',
		'9025.80.00',
		'VN',
		'4.1250',
		'0.042',
		100
	],
	[
		'SLV-SNS-DW2',
		'Latch door and window contact sensor, white',
		'8531.10.00',
		'VN',
		'3.05',
		'0.031',
		120
	],
	['SLV-PWR-20K', 'Ridge 20000 mAh power bank, USB-C', '8507.60.00', 'MY', '11.90', '0.390', 30]
] as const;

/** Prices per currency: JPY whole yen, KWD to the fils (fixed invented rates, not market data). */
const RATE: Record<string, { rate: string; decimals: number; minorUnits: number }> = {
	EUR: { rate: '1', decimals: 4, minorUnits: 2 },
	JPY: { rate: '161', decimals: 0, minorUnits: 0 },
	KWD: { rate: '0.3317', decimals: 3, minorUnits: 3 }
};

function money(value: Decimal.Value, minorUnits: number): string {
	return new Decimal(value).toFixed(minorUnits, Decimal.ROUND_HALF_UP);
}

function header(kind: 'commercial_invoice' | 'packing_list', revision: string) {
	return {
		title: kind === 'commercial_invoice' ? 'Commercial invoice' : 'Packing list',
		number: kind === 'commercial_invoice' ? 'CI-2026-00017' : 'PL-2026-00017',
		revision,
		revisionReason:
			revision === 'A' ? null : 'Seal number corrected after the container was stuffed',
		issuedOn: '2026-03-02',
		shipmentReference: 'SHP-2026-00042',
		exporter: EXPORTER,
		buyer: HALLVIK,
		consignee: HALLVIK_DC,
		notifyParty: BROKER,
		origin: { code: 'MYPKG', name: 'Port Klang', countryCode: 'MY', countryName: 'Malaysia' },
		destination: { code: 'DEHAM', name: 'Hamburg', countryCode: 'DE', countryName: 'Germany' },
		mode: 'Sea, full container',
		carrier: 'Tidewater Meridian Lines',
		vesselOrFlight: 'MV Serene Kestrel',
		voyageOrFlight: '014W',
		bookingNumber: 'TML-88213407',
		etd: '2026-03-09',
		eta: '2026-04-06',
		// ISO 6346 numbers (owner code invented); check digits as containerCheckDigit gives them.
		containers: [
			{ number: 'LNFU 123456 7', seal: 'SV-0048213', type: '40′ high cube (45G1)' },
			{ number: 'LNFU 765432 0', seal: null, type: '20′ general purpose (22G1)' }
		],
		marks:
			'HALLVIK HEIMTECHNIK\nBREMEN VIA HAMBURG\nREF SHP-2026-00042\nC/NO. 1–{cartons}\nMADE IN MALAYSIA / VIET NAM',
		cautions: [
			'The HS codes, origins and values are the exporter’s statement. Classification, origin and customs value are for the importer’s licensed customs broker to confirm; they are not a binding ruling.',
			'Power banks hold lithium-ion batteries (UN 3480/3481): they travel only as the carrier and the IMDG Code allow, packed and declared by trained staff.'
		]
	};
}

export interface InvoiceFixtureOptions {
	lines?: number;
	currency?: 'EUR' | 'JPY' | 'KWD';
	incoterm?: 'CIF' | 'FOB';
	revision?: string;
}

export function invoiceFixture(o: InvoiceFixtureOptions = {}): InvoiceSnapshot {
	const count = o.lines ?? 5;
	const currency = o.currency ?? 'EUR';
	const { rate, decimals, minorUnits } = RATE[currency]!;
	const code = o.incoterm ?? 'CIF';
	const lines: InvoiceLine[] = [];
	let net = new Decimal(0);
	let cartons = 0;
	for (let i = 0; i < count; i++) {
		const [sku, description, hsCode, origin, eur, netKg, perCarton] =
			PRODUCTS[i % PRODUCTS.length]!;
		const quantity = perCarton * (1 + ((i * 7) % 23));
		const unitPrice = new Decimal(eur).times(rate).toFixed(decimals, Decimal.ROUND_HALF_UP);
		lines.push({
			position: i + 1,
			sku,
			description:
				i % 11 === 3
					? `${description}; retail-boxed with multilingual quick-start leaflet and mains adapter for the destination market`
					: description,
			hsCode,
			originCountry: origin,
			quantity,
			unit: 'pcs',
			unitPrice,
			amount: money(new Decimal(unitPrice).times(quantity), minorUnits)
		});
		net = net.plus(new Decimal(netKg).times(quantity));
		cartons += quantity / perCarton;
	}
	const subtotal = lines.reduce((s, l) => s.plus(l.amount), new Decimal(0));
	const cif = code === 'CIF';
	const freight = money(new Decimal('1850').times(rate), minorUnits);
	const insurance = money(subtotal.plus(freight).times('1.1').times('0.002'), minorUnits);
	const total = cif ? subtotal.plus(freight).plus(insurance) : subtotal;
	const h = header('commercial_invoice', o.revision ?? 'A');
	return {
		...h,
		kind: 'commercial_invoice',
		incoterm: cif
			? { code: 'CIF', place: 'Hamburg', text: 'CIF Hamburg Incoterms® 2020' }
			: { code: 'FOB', place: 'Port Klang', text: 'FOB Port Klang Incoterms® 2020' },
		marks: h.marks.replace('{cartons}', String(cartons)),
		currency,
		minorUnits,
		paymentTerms: '30 % deposit, balance 60 days from bill of lading date',
		exportReason: 'Sale',
		lines,
		subtotal: money(subtotal, minorUnits),
		freight: cif
			? { included: true, amount: freight, note: 'Included: the seller’s cost under CIF' }
			: { included: false, amount: null, note: 'Not included: the buyer’s cost under FOB' },
		insurance: cif
			? {
					included: true,
					amount: insurance,
					note: 'Included: minimum cover (110 % of value) under CIF'
				}
			: { included: false, amount: null, note: 'Not included: the buyer’s cost under FOB' },
		total: money(total, minorUnits),
		netKg: net.toFixed(3),
		grossKg: net.times('1.18').toFixed(3, Decimal.ROUND_HALF_UP),
		packages: { count: cartons, kind: 'cartons', text: `${cartons} cartons` },
		declaration: {
			text: 'We declare that the information on this invoice is true and correct, and that the goods described are of the origin shown.',
			signatoryName: 'Nur Aisyah Rahim',
			signatoryTitle: 'Export manager',
			place: 'Bayan Lepas',
			date: '2026-03-02'
		}
	};
}

/** Cartons per product run and their packaging (mm, kg per carton). */
const CARTONS = [
	{
		sku: 'SLV-PBL-20',
		cartons: 40,
		units: 12,
		net: '7.440',
		gross: '8.640',
		l: 400,
		w: 300,
		h: 250
	},
	{
		sku: 'SLV-TWR-80',
		cartons: 24,
		units: 1,
		net: '14.800',
		gross: '18.200',
		l: 1150,
		w: 420,
		h: 380
	},
	{
		sku: 'SLV-SNS-TH1',
		cartons: 15,
		units: 100,
		net: '4.200',
		gross: '5.300',
		l: 390,
		w: 290,
		h: 210
	},
	{
		sku: 'SLV-PWR-20K',
		cartons: 36,
		units: 30,
		net: '11.700',
		gross: '12.900',
		l: 420,
		w: 320,
		h: 220
	}
];

export function packingListFixture(
	o: { rows?: number; revision?: string } = {}
): PackingListSnapshot {
	const count = o.rows ?? 4;
	const rows: PackingRow[] = [];
	let next = 1;
	const sum = { units: 0, net: new Decimal(0), gross: new Decimal(0), volume: new Decimal(0) };
	for (let i = 0; i < count; i++) {
		const c = CARTONS[i % CARTONS.length]!;
		const product = PRODUCTS.find((p) => p[0] === c.sku)!;
		const volume = new Decimal(c.l * c.w * c.h).times(c.cartons).div(1e9);
		const row: PackingRow = {
			fromCarton: next,
			toCarton: next + c.cartons - 1,
			cartons: c.cartons,
			sku: c.sku,
			description: product[1],
			unitsPerCarton: c.units,
			units: c.units * c.cartons,
			netKgPerCarton: c.net,
			grossKgPerCarton: c.gross,
			netKg: new Decimal(c.net).times(c.cartons).toFixed(3),
			grossKg: new Decimal(c.gross).times(c.cartons).toFixed(3),
			lengthMm: c.l,
			widthMm: c.w,
			heightMm: c.h,
			volumeM3: volume.toFixed(3, Decimal.ROUND_HALF_UP),
			pallets: `P${2 * i + 1}–P${2 * i + 2}`,
			lots:
				i % 2 === 0
					? [
							`Lot ${c.sku.slice(4)}-2602-A, serials ${1000 + next}–${1000 + next + c.cartons * c.units - 1}`
						]
					: []
		};
		rows.push(row);
		next += c.cartons;
		sum.units += row.units;
		sum.net = sum.net.plus(row.netKg);
		sum.gross = sum.gross.plus(row.grossKg);
		sum.volume = sum.volume.plus(row.volumeM3);
	}
	const pallets = 2 * count;
	const h = header('packing_list', o.revision ?? 'A');
	return {
		...h,
		kind: 'packing_list',
		incoterm: { code: 'CIF', place: 'Hamburg', text: 'CIF Hamburg Incoterms® 2020' },
		marks: h.marks.replace('{cartons}', String(next - 1)),
		rows,
		totals: {
			cartons: next - 1,
			units: sum.units,
			netKg: sum.net.toFixed(3),
			grossKg: sum.gross.toFixed(3),
			volumeM3: sum.volume.toFixed(3),
			pallets: {
				count: pallets,
				type: 'ISO 1200 × 1000 mm pallet',
				tareKg: new Decimal('23.500').times(pallets).toFixed(3),
				grossKg: sum.gross.plus(new Decimal('23.500').times(pallets)).toFixed(3),
				volumeM3: sum.volume.times('1.22').toFixed(3, Decimal.ROUND_HALF_UP)
			}
		},
		loadPlan: {
			containers: [
				{
					label: 'Container 1',
					type: '40′ high cube',
					pieces: 6,
					volumeUsedPercent: '71.4',
					payloadKg: '3120.000'
				},
				{
					label: 'Container 2',
					type: '20′ general purpose',
					pieces: 2,
					volumeUsedPercent: '38.0',
					payloadKg: '910.000'
				}
			],
			unplaced: 0
		}
	};
}

/** Two containers of pallet-sized boxes, drawn by the app's own projection. */
export function picturesFixture(): LoadPlanPictureForPdf[] {
	const colours = ['#3f7fbf', '#d08c2f', '#5a9e6f'];
	const skus = ['SLV-PBL-20', 'SLV-TWR-80', 'SLV-PWR-20K'];
	const make = (count: number): { boxes: PlacedBox[]; legend: LoadPlanPictureForPdf['legend'] } => {
		const boxes: PlacedBox[] = [];
		for (let k = 0; k < count; k++) {
			const x = Math.floor(k / 4) * 1200;
			const y = (k % 2) * 1100;
			const z = (Math.floor(k / 2) % 2) * 1200;
			boxes.push({ x, y, z, dx: 1200, dy: 1000, dz: 1150, colour: colours[k % 3]! });
		}
		const legend = skus.map((sku, i) => ({
			sku,
			colour: colours[i]!,
			count: boxes.filter((b) => b.colour === colours[i]).length
		}));
		return { boxes, legend };
	};
	const size40 = { lengthMm: 12032, widthMm: 2352, heightMm: 2698 };
	const size20 = { lengthMm: 5898, widthMm: 2352, heightMm: 2393 };
	const one = make(24);
	const two = make(8);
	return [
		{
			label: 'Container 1 · LNFU 123456 7 · isometric',
			drawing: drawContainer(size40, one.boxes, { kind: 'iso', turn: 0 }),
			legend: one.legend
		},
		{
			label: 'Container 1 · side view',
			drawing: drawContainer(size40, one.boxes, { kind: 'side' }),
			legend: one.legend
		},
		{
			label: 'Container 2 · LNFU 765432 0 · isometric',
			drawing: drawContainer(size20, two.boxes, { kind: 'iso', turn: 0 }),
			legend: two.legend
		}
	];
}
