import type { Config } from 'tailwindcss';

/** Shoalwise's own palette: deep-water blues, a kelp green for "fine", amber for "watch", ember for "act now". */
export default {
  content: ['./index.html', './client/**/*.{ts,tsx}'],
  darkMode: 'media',
  theme: {
    extend: {
      fontFamily: {
        sans: ['Nunito', 'ui-sans-serif', 'system-ui', 'sans-serif'],
      },
      colors: {
        tide: {
          50: '#eef8fa',
          100: '#d4eef3',
          200: '#a9dce6',
          300: '#72c2d3',
          400: '#3fa3ba',
          500: '#23869f',
          600: '#1a6c84',
          700: '#18576b',
          800: '#174858',
          900: '#153c4a',
          950: '#0a2631',
        },
        sand: { 50: '#fbf9f4', 100: '#f4efe2', 200: '#e8ddc3', 300: '#d6c49c', 400: '#c2a873' },
        kelp: { 100: '#dff3e4', 500: '#2f8f4e', 700: '#226b3a' },
        amber: { 100: '#fdf0d5', 500: '#c98a0b', 700: '#8a5d05' },
        ember: { 100: '#fde3df', 500: '#d1432f', 700: '#9c2a1b' },
      },
      spacing: { 'touch': '2.75rem', '18': '4.5rem' },
      borderRadius: { card: '0.875rem' },
      boxShadow: { card: '0 1px 2px rgb(10 38 49 / 0.06), 0 2px 8px rgb(10 38 49 / 0.06)' },
    },
  },
} satisfies Config;
