import type { Config } from 'tailwindcss';
import plugin from 'tailwindcss/plugin';

/*
 * Pourscope design tokens. Every colour the client uses is defined here, once.
 *
 * Raw scales (names are ours):
 *   sand      warm paper tones, the light surfaces and dark-mode text
 *   graphite  warm charcoal, light-mode ink and dark-mode surfaces
 *   ember     the hot accent: the one primary action on a screen, temperature readouts
 *   tide      the cool accent: links, information, focus rings
 *   ochre / rust / moss   caution / danger / sound (a defect-free casting)
 *
 * Components use the semantic names below (bg-surface, text-ink, bg-accent, ...).
 * They are CSS variables, so light and dark come from the same tokens: the
 * `dark` class on <html> swaps the values (see public/theme-boot.js and
 * src/lib/theme.ts).
 *
 * Contrast (WCAG 2.x ratio, measured on the hex values below):
 *   Light                                   Dark
 *   ink on surface         15.87            ink on surface         14.41
 *   ink on sunken          14.41            ink on raised          12.85
 *   ink-muted on surface    7.09            ink-muted on surface    7.74
 *   ink-muted on sunken     6.43            ink-muted on raised     6.90
 *   on-accent on accent     5.74            on-accent on accent     7.05
 *   on-accent on hover      7.27            on-accent on hover      8.31
 *   heat on surface         7.94 (AAA)      heat on surface         8.31 (AAA)
 *   heat on sunken          7.21 (AAA)      heat on raised          7.41 (AAA)
 *   link on surface         6.70            link on surface         8.62
 *   link on sunken          6.09            link on raised          7.68
 *   caution on caution-bg   7.01            caution on caution-bg   9.48
 *   danger on danger-bg     6.78            danger on danger-bg     7.90
 *   sound on sound-bg       6.36            sound on sound-bg       8.75
 *   info on info-bg         6.13            info on info-bg         7.77
 *   line-strong on surface  3.67 (≥3:1 for input borders; raised 3.92 / 3.77)
 *   focus ring on surface   5.10            focus ring on surface   8.62
 *   Defect outlines on surface (non-text, ≥3:1):
 *   gas 3.99, shrinkage 4.61, filling 3.74, inclusion 5.08, surface 4.00,
 *   crack 4.66, dimensional 4.86    |  dark: 6.89, 6.29, 9.30, 6.58, 7.87, 6.91, 7.42
 * `line` (dividers only, never the sole boundary of a control) is decorative.
 * Each defect group also has its own letter code and label shape
 * (src/config/defect-groups.ts), so colour is never the only cue.
 */

const sand = {
  50: '#FAF7F2',
  100: '#F1ECE3',
  200: '#E8E0D3',
  300: '#DDD4C6',
  400: '#B5AB9C',
  500: '#8A7F70',
} as const;

const graphite = {
  400: '#857B6E',
  500: '#7D7468',
  600: '#5A534B',
  700: '#3F3A33',
  800: '#26231F',
  900: '#1F1C19',
  950: '#1B1916',
  980: '#141210',
} as const;

const ember = {
  100: '#F8E2D4',
  300: '#F59E62',
  400: '#F08A4B',
  600: '#B3400F',
  700: '#9A3509',
  800: '#8A2E07',
} as const;

const tide = {
  100: '#E4EFF6',
  300: '#86BCE3',
  500: '#2F7FC1',
  600: '#1D6FA3',
  700: '#1D5C87',
  950: '#16242F',
} as const;

const ochre = { 100: '#FBF0D5', 300: '#F2C770', 500: '#C99A3A', 600: '#A06C00', 800: '#6E4A00', 950: '#2E2513' } as const;
const rust = { 100: '#FBE7E3', 300: '#F6A195', 500: '#E0685A', 600: '#C2382D', 800: '#9B1F17', 950: '#351B19' } as const;
const moss = { 100: '#E5F2E4', 300: '#95D3A0', 500: '#5FAF6C', 600: '#3F8A4B', 800: '#2A6133', 950: '#172A1B' } as const;

/** Mark outline colours per defect group; dark variants are lighter for dark casting photos and dark mode. */
const defect = {
  gas: { light: '#2F7FC1', dark: '#5AA9E6' },
  shrinkage: { light: '#C4471D', dark: '#EE7A4F' },
  filling: { light: '#A87600', dark: '#E9B53A' },
  inclusion: { light: '#8A4FB5', dark: '#BB8BE0' },
  surface: { light: '#0E8A75', dark: '#35C2A6' },
  crack: { light: '#C23A82', dark: '#EE7DB9' },
  dimensional: { light: '#5E6E85', dark: '#9AAAC0' },
} as const;

const lightTokens = {
  surface: sand[50],
  'surface-raised': '#FFFFFF',
  'surface-sunken': sand[100],
  ink: graphite[900],
  'ink-muted': graphite[600],
  line: sand[300],
  'line-strong': sand[500],
  accent: ember[600],
  'accent-hover': ember[700],
  'on-accent': '#FFFFFF',
  'accent-soft': ember[100],
  heat: ember[800],
  link: tide[700],
  focus: tide[600],
  info: tide[700],
  'info-bg': tide[100],
  'info-line': tide[500],
  caution: ochre[800],
  'caution-bg': ochre[100],
  'caution-line': ochre[600],
  danger: rust[800],
  'danger-bg': rust[100],
  'danger-line': rust[600],
  sound: moss[800],
  'sound-bg': moss[100],
  'sound-line': moss[600],
  ...Object.fromEntries(Object.entries(defect).map(([k, v]) => [`defect-${k}`, v.light])),
} as const;

const darkTokens = {
  surface: graphite[950],
  'surface-raised': graphite[800],
  'surface-sunken': graphite[980],
  ink: sand[100],
  'ink-muted': sand[400],
  line: graphite[700],
  'line-strong': graphite[400],
  accent: ember[400],
  'accent-hover': ember[300],
  'on-accent': graphite[950],
  'accent-soft': '#3A2418',
  heat: ember[300],
  link: tide[300],
  focus: tide[300],
  info: tide[300],
  'info-bg': tide[950],
  'info-line': '#5A9BCB',
  caution: ochre[300],
  'caution-bg': ochre[950],
  'caution-line': ochre[500],
  danger: rust[300],
  'danger-bg': rust[950],
  'danger-line': rust[500],
  sound: moss[300],
  'sound-bg': moss[950],
  'sound-line': moss[500],
  ...Object.fromEntries(Object.entries(defect).map(([k, v]) => [`defect-${k}`, v.dark])),
} as const;

const toVars = (tokens: Record<string, string>) =>
  Object.fromEntries(Object.entries(tokens).map(([k, v]) => [`--ps-${k}`, v]));

const v = (name: keyof typeof lightTokens) => `var(--ps-${name})`;

/*
 * Type scale. Steps are fixed; the roles (caption, body, ...) point at a step.
 * Bench screens (the furnace-side ones) add the `bench` class to their root,
 * which moves every role one step up.
 */
const steps = ['0.8125rem', '0.875rem', '1rem', '1.125rem', '1.375rem', '1.75rem', '2.25rem', '3rem', '3.75rem'];
const roles = ['caption', 'body', 'lead', 'title', 'heading', 'display', 'readout'] as const;
const deskStep: Record<(typeof roles)[number], number> = {
  caption: 1,
  body: 2,
  lead: 3,
  title: 4,
  heading: 5,
  display: 6,
  readout: 7,
};
const lineHeights: Record<(typeof roles)[number], string> = {
  caption: '1.4',
  body: '1.5',
  lead: '1.45',
  title: '1.3',
  heading: '1.2',
  display: '1.1',
  readout: '1',
};
const roleVars = (shift: number) =>
  Object.fromEntries(roles.map((r) => [`--ps-text-${r}`, steps[deskStep[r] + shift]]));

const sans = ['"IBM Plex Sans"', 'ui-sans-serif', 'system-ui', 'sans-serif'];
const mono = ['"IBM Plex Mono"', 'ui-monospace', 'monospace'];

export default {
  darkMode: 'class',
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    // Our palette replaces the framework's, so only our tokens exist.
    colors: {
      transparent: 'transparent',
      current: 'currentColor',
      inherit: 'inherit',
      white: '#FFFFFF',
      black: '#000000',
      sand,
      graphite,
      ember,
      tide,
      ochre,
      rust,
      moss,
      surface: { DEFAULT: v('surface'), raised: v('surface-raised'), sunken: v('surface-sunken') },
      ink: { DEFAULT: v('ink'), muted: v('ink-muted') },
      line: { DEFAULT: v('line'), strong: v('line-strong') },
      accent: { DEFAULT: v('accent'), hover: v('accent-hover'), soft: v('accent-soft') },
      'on-accent': v('on-accent'),
      heat: v('heat'),
      link: v('link'),
      focus: v('focus'),
      info: { DEFAULT: v('info'), bg: v('info-bg'), line: v('info-line') },
      caution: { DEFAULT: v('caution'), bg: v('caution-bg'), line: v('caution-line') },
      danger: { DEFAULT: v('danger'), bg: v('danger-bg'), line: v('danger-line') },
      sound: { DEFAULT: v('sound'), bg: v('sound-bg'), line: v('sound-line') },
      defect: Object.fromEntries(Object.keys(defect).map((k) => [k, `var(--ps-defect-${k})`])),
    },
    fontFamily: { sans, mono },
    fontSize: Object.fromEntries(
      roles.map((r) => [r, [`var(--ps-text-${r})`, { lineHeight: lineHeights[r] }]]),
    ),
    borderRadius: {
      none: '0',
      sm: '0.25rem',
      DEFAULT: '0.375rem',
      md: '0.5rem',
      lg: '0.75rem',
      full: '9999px',
    },
    extend: {
      maxWidth: { prose: '68ch' },
    },
  },
  plugins: [
    plugin(({ addBase }) => {
      addBase({
        ':root': { ...toVars(lightTokens), ...roleVars(0), colorScheme: 'light' },
        ':root.dark': { ...toVars(darkTokens), colorScheme: 'dark' },
        '.bench': roleVars(1),
      });
    }),
  ],
} satisfies Config;
