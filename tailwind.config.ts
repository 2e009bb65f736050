import type { Config } from 'tailwindcss';

/**
 * Theme tokens are CSS variables (defined per display mode in src/styles/theme.css), so one set of
 * utilities serves day, night and system modes. `colors` replaces Tailwind's palette on purpose:
 * only our tokens exist, so no screen can pick up a stray white or blue that would glare at night.
 */
const token = (name: string) => `var(--rs-${name})`;

export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    colors: {
      transparent: 'transparent',
      current: 'currentColor',
      inherit: 'inherit',
      paper: token('paper'),
      surface: token('surface'),
      sunk: token('sunk'),
      ink: token('ink'),
      muted: token('muted'),
      line: token('line'),
      accent: token('accent'),
      'accent-ink': token('accent-ink'),
      danger: token('danger'),
      focus: token('focus'),
    },
    extend: {
      screens: {
        // Phones are everything up to and including 640px wide.
        sm: '641px',
      },
      fontFamily: {
        sans: ['"Atkinson Hyperlegible Next Variable"', 'system-ui', 'sans-serif'],
        mono: ['"Atkinson Hyperlegible Mono Variable"', 'ui-monospace', 'monospace'],
      },
      minHeight: {
        touch: '3rem',
      },
      minWidth: {
        touch: '3rem',
      },
      spacing: {
        'bottom-bar': '4.5rem',
      },
    },
  },
} satisfies Config;
