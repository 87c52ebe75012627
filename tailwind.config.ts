import type { Config } from 'tailwindcss';

// Baskwell's own palette: a warm "basalt and sunlit sand" set for the app chrome,
// kept apart from the field colour scales (which are colour-blind-safe and defined in the engine's contours).
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        basalt: {
          50: '#f5f6f4',
          100: '#e6e8e3',
          200: '#cdd1c8',
          300: '#a9afa1',
          400: '#7e8673',
          500: '#5f6756',
          600: '#4a5143',
          700: '#3b4036',
          800: '#2b2f28',
          900: '#1c1f1a',
        },
        sand: {
          50: '#fdf9ef',
          100: '#f9efd6',
          200: '#f2dcab',
          300: '#e9c475',
          400: '#dfa845',
          500: '#d18f2b',
          600: '#b67222',
          700: '#94561f',
          800: '#784520',
          900: '#633a1d',
        },
        moss: {
          50: '#f1f8f1',
          100: '#ddeedd',
          200: '#bcdcbd',
          300: '#8fc292',
          400: '#5fa265',
          500: '#3e8546',
          600: '#2e6a36',
          700: '#27552e',
          800: '#224428',
          900: '#1d3822',
        },
        ember: {
          50: '#fdf3f2',
          100: '#fbe4e1',
          200: '#f8cdc7',
          300: '#f2aa9f',
          400: '#e87b6a',
          500: '#da5540',
          600: '#c53c27',
          700: '#a5301f',
          800: '#892c1e',
          900: '#722a1f',
        },
        sky: {
          50: '#f0f7fc',
          100: '#ddedf8',
          200: '#c2e0f3',
          300: '#98cbea',
          400: '#67aede',
          500: '#4592d2',
          600: '#3377c5',
          700: '#2b63b4',
          800: '#295193',
          900: '#254575',
        },
      },
      fontFamily: {
        sans: ['var(--font-sans)', 'system-ui', 'sans-serif'],
        mono: ['ui-monospace', 'SFMono-Regular', 'Menlo', 'monospace'],
      },
      fontSize: {
        caption: ['0.75rem', { lineHeight: '1rem' }],
        body: ['0.9375rem', { lineHeight: '1.5rem' }],
        lead: ['1.125rem', { lineHeight: '1.75rem' }],
        title: ['1.5rem', { lineHeight: '2rem', fontWeight: '600' }],
        display: ['2.5rem', { lineHeight: '2.875rem', fontWeight: '700' }],
      },
    },
  },
};

export default config;
