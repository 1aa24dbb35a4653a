/**
 * Landfall's product colours for load pictures: ten hues of our own, far apart in hue and
 * lightness so neighbouring products stay apart for most colour-vision deficiencies too, each
 * dark enough for a white outline and light enough for a dark one. Products beyond ten repeat
 * the hues; the legend and the step readout name them, so colour is never the only cue.
 */
export const PRODUCT_COLOURS = [
	'#2b6cb0', // deep blue
	'#e3912b', // amber
	'#2f9e6e', // green
	'#c44d64', // raspberry
	'#7a5fb0', // violet
	'#c4b032', // mustard
	'#3fa4bd', // teal
	'#8c6446', // walnut
	'#5b6f86', // slate
	'#d675b6' // orchid
] as const;

/** One colour per key (SKU), in the order the keys are first given. */
export function colourMap(keys: readonly string[]): Map<string, string> {
	const out = new Map<string, string>();
	for (const key of keys) {
		if (!out.has(key)) out.set(key, PRODUCT_COLOURS[out.size % PRODUCT_COLOURS.length]!);
	}
	return out;
}

/** `hex` scaled towards black by `factor` (1 = unchanged), for the shaded sides of a box. */
export function shade(hex: string, factor: number): string {
	const n = Number.parseInt(hex.slice(1), 16);
	const channel = (shift: number) =>
		Math.max(0, Math.min(255, Math.round(((n >> shift) & 255) * factor)));
	const out = (channel(16) << 16) | (channel(8) << 8) | channel(0);
	return `#${out.toString(16).padStart(6, '0')}`;
}
