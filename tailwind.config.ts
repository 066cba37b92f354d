import type { Config } from 'tailwindcss';
import plugin from 'tailwindcss/plugin';

/**
 * Shoalwise's own look: deep-water blues on a sand-white page, kelp green for "fine", amber for "watch",
 * ember for "act now". Screens use the named roles below (`bg-surface`, `text-ink-muted`, `bg-danger-soft`…),
 * never raw shades, so each role has one value per colour scheme and dark mode follows the system setting.
 * tests/unit/design-tokens.test.ts checks every text/background pair for WCAG AA contrast in both schemes.
 */
export const THEMES = {
  light: {
    canvas: '#fbf9f4', // the page behind the cards
    surface: '#ffffff', // cards, inputs, menus
    tint: '#eef8fa', // quiet panels, hover
    'tint-strong': '#d4eef3', // selected, a panel inside a panel
    ink: '#153c4a', // headings and figures
    'ink-soft': '#174858', // body text
    'ink-muted': '#1a6179', // labels, hints, times
    link: '#18576b',
    line: '#d4eef3', // dividers and card edges (decorative)
    'line-strong': '#5f8d9d', // edges of controls: 3:1 against what surrounds them
    accent: '#18576b', // the main action
    'accent-hover': '#174858',
    'on-accent': '#ffffff',
    chrome: '#174858', // the app's header
    'chrome-active': '#1a6c84',
    'on-chrome': '#ffffff',
    'on-chrome-muted': '#d4eef3',
    ok: '#226b3a',
    'ok-soft': '#dff3e4',
    watch: '#8a5d05',
    'watch-soft': '#fdf0d5',
    danger: '#9c2a1b',
    'danger-soft': '#fde3df',
    'danger-solid': '#c13c29', // a destructive button
    'on-danger': '#ffffff',
    focus: '#1a6c84',
  },
  dark: {
    canvas: '#0b1e26',
    surface: '#112a34',
    tint: '#173541',
    'tint-strong': '#1e4453',
    ink: '#eef8fa',
    'ink-soft': '#d4eef3',
    'ink-muted': '#a3cbd5',
    link: '#8fd3e3',
    line: '#24495a',
    'line-strong': '#6a97a7',
    accent: '#72c2d3',
    'accent-hover': '#a9dce6',
    'on-accent': '#0a2631',
    chrome: '#0e2a35',
    'chrome-active': '#1e4a5a',
    'on-chrome': '#eef8fa',
    'on-chrome-muted': '#b6dde6',
    ok: '#86d9a0',
    'ok-soft': '#133524',
    watch: '#f0c46a',
    'watch-soft': '#3a2c0c',
    danger: '#ffa394',
    'danger-soft': '#421913',
    'danger-solid': '#ff8f7d',
    'on-danger': '#2a0a05',
    focus: '#8fd3e3',
  },
} as const satisfies Record<'light' | 'dark', Record<string, `#${string}`>>;

export type ColorRole = keyof typeof THEMES.light;

const roleVar = (role: string) => `--sw-${role}`;

/** A role's colour for places that take a colour value rather than a class (chart strokes and fills). */
export const colorVar = (role: ColorRole) => `var(${roleVar(role)})`;
const asVars = (theme: Record<string, string>) =>
  Object.fromEntries(Object.entries(theme).map(([role, value]) => [roleVar(role), value]));

/** The roles as CSS variables on :root, switched by the system's colour scheme; the focus ring reads them too. */
const themeVariables = plugin(({ addBase }) => {
  addBase({
    ':root': { ...asVars(THEMES.light), colorScheme: 'light dark' },
    '@media (prefers-color-scheme: dark)': { ':root': asVars(THEMES.dark) },
    ':focus-visible': { outline: `3px solid var(${roleVar('focus')})`, outlineOffset: '2px' },
  });
});

export default {
  content: ['./index.html', './client/**/*.{ts,tsx}'],
  darkMode: 'media',
  theme: {
    extend: {
      fontFamily: {
        sans: ['Nunito', 'ui-sans-serif', 'system-ui', 'sans-serif'],
      },
      colors: Object.fromEntries(Object.keys(THEMES.light).map((role) => [role, `var(${roleVar(role)})`])),
      spacing: { touch: '2.75rem', '18': '4.5rem' },
      borderRadius: { card: '0.875rem', control: '0.75rem' },
      boxShadow: { card: '0 1px 2px rgb(10 38 49 / 0.06), 0 2px 8px rgb(10 38 49 / 0.06)' },
    },
  },
  plugins: [themeVariables],
} satisfies Config;
