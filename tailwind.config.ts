import type { Config } from 'tailwindcss';

const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}', './content/**/*.mdx'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['var(--font-sans)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-mono)', 'ui-monospace', 'monospace'],
      },
      colors: {
        // Our own palette: a leaf green for the brand, a clay for cautions.
        leaf: { 50: '#f2f7f1', 100: '#dfeddc', 600: '#3f7a3a', 700: '#2f5f2c', 900: '#1b3619' },
        clay: { 50: '#fbf4ec', 200: '#efd2ae', 700: '#8a4b16' },
      },
    },
  },
};

export default config;
