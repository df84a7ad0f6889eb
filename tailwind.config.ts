import type { Config } from 'tailwindcss';

// Slotwise tokens: calm graphite neutrals, one accent ("signal teal"), severity colours
// that pass WCAG AA on white, and an 8 px spacing grid (Tailwind's default 4 px steps,
// used in pairs).
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['"Space Grotesk"', 'system-ui', 'sans-serif'],
      },
      colors: {
        ink: {
          DEFAULT: '#1d2329',
          soft: '#3c4650',
          muted: '#5d6873',
        },
        paper: {
          DEFAULT: '#f6f7f5',
          raised: '#ffffff',
          sunk: '#eceeeb',
          line: '#d5d9d6',
        },
        accent: {
          DEFAULT: '#0b7a75',
          strong: '#075b57',
          soft: '#d7efed',
          ink: '#ffffff',
        },
        severity: {
          error: '#b42318',
          'error-soft': '#fde8e6',
          warning: '#8a5a00',
          'warning-soft': '#fff3d6',
          note: '#285e9e',
          'note-soft': '#e3eefb',
          ok: '#1f7a3a',
          'ok-soft': '#e2f4e7',
        },
        metal: '#b9c0c6',
      },
      borderRadius: {
        card: '10px',
      },
    },
  },
} satisfies Config;
