import type { Config } from 'tailwindcss';

// Margin's own palette: warm paper, graphite ink, an oxide red for the margin rule and
// calls to action, and a river blue for data. Loaded from app/globals.css via @config.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}', './blocks/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#f6f2ea', deep: '#ece5d8', edge: '#d9cfbf' },
        ink: { DEFAULT: '#23272b', soft: '#4a5157', faint: '#7b8288' },
        oxide: { DEFAULT: '#a8452a', soft: '#c9765b', wash: '#f3e0d7' },
        river: { DEFAULT: '#2f5d73', soft: '#5b8aa0', wash: '#dde9ee' },
        moss: { DEFAULT: '#4f6b3a', wash: '#e3ead9' },
        amber: { DEFAULT: '#9a6a12', wash: '#f4e8cc' },
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif'],
        serif: ['"Source Serif 4"', 'Georgia', 'serif'],
        mono: ['"IBM Plex Mono"', 'ui-monospace', 'monospace'],
      },
    },
  },
};

export default config;
