// Fringefield design tokens: an original palette and a type scale.
// Colours are our own picks; layer colours in the preview come from here too.
// Small text (WCAG 2.2 SC 1.4.3, 4.5:1): ground-600 on white or ground-50, ground-200 or copper-200 on ground-800,
// white on copper-600/800; ground-400 is for borders and graphics only (3.1:1 on white, 4.49:1 on ground-800).
// tests/unit/source/contrast-tokens.test.ts checks these pairs.
import type { Config } from 'tailwindcss';

export default {
	content: ['./src/**/*.{html,svelte,ts}'],
	theme: {
		extend: {
			colors: {
				// metal on the board
				copper: { 50: '#fbf3ec', 200: '#eec5a2', 400: '#d98f55', 600: '#b0622b', 800: '#6e3a17' },
				// laminate between the coppers
				substrate: { 50: '#f3f6ee', 200: '#d3dfbf', 400: '#9bb174', 600: '#627a3d', 800: '#34421f' },
				// ground plane and chrome
				ground: { 50: '#eef1f5', 200: '#c9d1dc', 400: '#8594a8', 600: '#4b5a70', 800: '#242d3b', 900: '#161c26' },
				drill: { 400: '#7c6fb0', 600: '#54478c' },
				warning: { 100: '#fdf1d8', 500: '#c98a0c', 700: '#8a5c04' },
				error: { 100: '#fbe3df', 500: '#c2412d', 700: '#86281a' },
				ok: { 100: '#e2f3ea', 500: '#2f8f5b', 700: '#1f6240' }
			},
			fontFamily: {
				sans: ['"Inter Variable"', 'system-ui', 'sans-serif'],
				mono: ['"JetBrains Mono"', 'ui-monospace', 'monospace']
			},
			fontSize: {
				// a 1.2 modular scale on a 15 px base
				caption: ['0.72rem', { lineHeight: '1rem' }],
				body: ['0.9375rem', { lineHeight: '1.45rem' }],
				lead: ['1.125rem', { lineHeight: '1.65rem' }],
				title: ['1.35rem', { lineHeight: '1.8rem' }],
				headline: ['1.62rem', { lineHeight: '2.1rem' }],
				display: ['1.95rem', { lineHeight: '2.4rem' }]
			}
		}
	}
} satisfies Config;
