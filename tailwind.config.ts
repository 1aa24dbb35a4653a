import type { Config } from 'tailwindcss';

// Landfall's design tokens. The palette is our own: warm "shore" neutrals for surfaces,
// "basalt" for ink, "kelp" green for primary actions, "beacon" orange for emphasis,
// and separate status hues. Every text/background pairing used passes WCAG AA contrast.
export default {
	content: ['./src/**/*.{html,svelte,ts}'],
	theme: {
		extend: {
			colors: {
				shore: {
					50: '#fbfaf6',
					100: '#f5f1e8',
					200: '#e9e2d2',
					300: '#d6cbb3',
					400: '#b5a888'
				},
				basalt: {
					400: '#7d8784',
					500: '#5e6866',
					600: '#48524f',
					700: '#343d3b',
					800: '#232b29',
					900: '#161c1b'
				},
				kelp: {
					50: '#eef6f2',
					100: '#d5eae0',
					300: '#7fbb9f',
					500: '#2f7d5e',
					600: '#236649',
					700: '#1b5139',
					800: '#143c2b'
				},
				beacon: {
					100: '#fbe5d8',
					500: '#c8551f',
					600: '#a84417',
					700: '#873612'
				},
				status: {
					ok: '#1d6b43',
					warn: '#8a5a00',
					danger: '#b42318',
					info: '#235a8c'
				}
			},
			fontFamily: {
				sans: ['"Roboto Flex"', 'system-ui', 'sans-serif'],
				mono: ['ui-monospace', 'DejaVu Sans Mono', 'monospace']
			},
			// Type scale: a 1.2 ratio from a 15 px body.
			fontSize: {
				caption: ['0.78rem', { lineHeight: '1.1rem', letterSpacing: '0.01em' }],
				body: ['0.94rem', { lineHeight: '1.45rem' }],
				lead: ['1.125rem', { lineHeight: '1.6rem' }],
				title: ['1.35rem', { lineHeight: '1.8rem', letterSpacing: '-0.005em' }],
				display: ['1.95rem', { lineHeight: '2.3rem', letterSpacing: '-0.015em' }]
			},
			borderRadius: {
				card: '0.6rem'
			},
			boxShadow: {
				card: '0 1px 2px rgba(22, 28, 27, 0.06), 0 2px 8px rgba(22, 28, 27, 0.05)'
			}
		}
	}
} satisfies Config;
