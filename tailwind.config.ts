import type { Config } from 'tailwindcss'

// Kernwise palette: cool "slate ink" neutrals for calm chrome, a single "signal" accent,
// and a stress pair that differs in hue AND lightness (compression dark blue-violet,
// tension light ochre) so it survives colour-blind viewing and greyscale printing.
export default {
  darkMode: 'class',
  content: [
    
    './app.vue',
    './pages/**/*.vue',
    './components/**/*.{vue,ts}',
    './layouts/**/*.vue',
    './composables/**/*.ts',
    './shared/**/*.ts',
  ],
  theme: {
    extend: {
      colors: {
        ink: {
          0: '#ffffff',
          25: '#f7f8fa',
          50: '#eef1f5',
          100: '#dfe4eb',
          200: '#c4ccd7',
          300: '#a2adbc',
          400: '#667385',
          500: '#5d6a7c',
          600: '#465263',
          700: '#343e4d',
          800: '#232a35',
          900: '#161b23',
          950: '#0d1016',
        },
        signal: {
          50: '#eefaf6',
          100: '#d3f2e8',
          300: '#7fd2b8',
          500: '#1f9e7e',
          600: '#148066',
          700: '#116652',
          900: '#0b3b31',
        },
        comp: { light: '#b9c2ea', DEFAULT: '#3a3f9e', dark: '#23266b' },
        tens: { light: '#f7e2b0', DEFAULT: '#d59a1c', dark: '#8a5a00' },
        warn: { 50: '#fff6e8', 500: '#c77700', 700: '#8f5300' },
        fault: { 50: '#fdeeee', 500: '#c8323a', 700: '#95222a' },
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif'],
        mono: ['"IBM Plex Mono"', 'ui-monospace', 'monospace'],
      },
      fontSize: {
        '2xs': ['0.6875rem', { lineHeight: '1rem' }],
        xs: ['0.75rem', { lineHeight: '1.05rem' }],
        sm: ['0.8125rem', { lineHeight: '1.2rem' }],
        base: ['0.875rem', { lineHeight: '1.35rem' }],
        lg: ['1rem', { lineHeight: '1.5rem' }],
        xl: ['1.25rem', { lineHeight: '1.75rem' }],
        '2xl': ['1.625rem', { lineHeight: '2.1rem' }],
      },
      spacing: {
        panel: '21rem',
        rail: '3.25rem',
      },
      borderRadius: {
        sm: '3px',
        DEFAULT: '5px',
        md: '6px',
      },
      boxShadow: {
        float: '0 6px 24px -8px rgb(13 16 22 / 0.25), 0 1px 2px rgb(13 16 22 / 0.08)',
      },
    },
  },
  plugins: [],
} satisfies Config
