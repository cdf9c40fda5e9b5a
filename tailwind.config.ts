import type { Config } from 'tailwindcss';

/**
 * Nodewright design tokens. A drafting-table look: warm paper, graphite ink,
 * one deep "orbit" blue for actions and an ochre "sunline" reserved for
 * computed values, so a reader can always tell a number the engine produced.
 * Status colours stay distinguishable in greyscale (each also has a glyph).
 * Text colours (ink and its soft and faint shades, the 500–700 blues, the
 * 700 shades) keep at least 4.5:1 against every paper tone (WCAG 2.1 success
 * criterion 1.4.3); the browser tests check it with axe-core.
 */
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#f6f5f1', raised: '#ffffff', sunk: '#ecebe5' },
        ink: { DEFAULT: '#1d2430', soft: '#4a5262', faint: '#5f6674' },
        rule: { DEFAULT: '#d9d6cc', strong: '#b9b5a8' },
        orbit: { 50: '#eef2f9', 100: '#d8e1f0', 500: '#3d5a8f', 600: '#2f4a7a', 700: '#243a61', 900: '#16233b' },
        sunline: { 50: '#fbf4e6', 100: '#f4e3bf', 500: '#b7791f', 700: '#7f5314' },
        moss: { 50: '#eef4ea', 500: '#4d7c3a', 700: '#365a28' },
        ember: { 50: '#f9ecea', 500: '#a23b2a', 700: '#7a2a1d' },
      },
      fontFamily: {
        sans: ['var(--font-plex-sans)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-plex-mono)', 'ui-monospace', 'monospace'],
      },
      fontSize: {
        micro: ['0.6875rem', { lineHeight: '1rem', letterSpacing: '0.04em' }],
        note: ['0.8125rem', { lineHeight: '1.25rem' }],
        body: ['0.9375rem', { lineHeight: '1.5rem' }],
        lead: ['1.125rem', { lineHeight: '1.75rem' }],
        title: ['1.5rem', { lineHeight: '2rem', letterSpacing: '-0.01em' }],
        display: ['2rem', { lineHeight: '2.5rem', letterSpacing: '-0.015em' }],
      },
      spacing: { gutter: '1.25rem', sheet: '52rem' },
      borderRadius: { chip: '0.25rem', card: '0.375rem', sheet: '0.5rem' },
      boxShadow: { sheet: '0 1px 2px rgba(29,36,48,0.06), 0 4px 16px rgba(29,36,48,0.05)' },
    },
  },
};

export default config;
