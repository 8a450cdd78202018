import type { Config } from 'tailwindcss';

// Seamwright's own palette: a warm paper bench, ink-dark text, a kiln-orange seam line for
// actions and a moss green for "fits". Contrast pairs were chosen for WCAG 2.1 AA on paper.
export default {
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#f7f5f0', deep: '#ece8df' },
        ink: { DEFAULT: '#1f2a30', soft: '#44535c', faint: '#6b7a83' },
        kiln: { DEFAULT: '#a8471f', bright: '#e07a4a', pale: '#fbe9df' },
        moss: { DEFAULT: '#3d6a4c', pale: '#e3efe6' },
        caution: { DEFAULT: '#8a5a00', pale: '#fdf3d8' },
      },
      fontFamily: {
        sans: ['"Inter Variable"', 'system-ui', 'sans-serif'],
      },
      fontSize: {
        // A type scale readable at arm's length from a workbench.
        body: ['1.0625rem', { lineHeight: '1.6' }],
        lead: ['1.25rem', { lineHeight: '1.5' }],
        title: ['2rem', { lineHeight: '1.2', letterSpacing: '-0.01em' }],
      },
      borderRadius: { card: '0.75rem' },
    },
  },
} satisfies Config;
