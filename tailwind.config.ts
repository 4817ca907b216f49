import type { Config } from 'tailwindcss';

/** Seamrun design tokens: thread teal, madder red, indigo dye, on unbleached calico. */
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        calico: { 50: '#FBF8F2', 100: '#F4EFE6', 200: '#E8DFCF', 300: '#D6C8B0' },
        thread: { 500: '#1F6F7F', 600: '#15596A', 700: '#0F4C5C', 800: '#0B3945', 900: '#072A33' },
        madder: { 100: '#F7E3DD', 500: '#B5523B', 600: '#9A432F', 700: '#7D3524' },
        indigo: { 100: '#E3E6F3', 500: '#3D4A8C', 700: '#2A3366' },
        saffron: { 100: '#FBF0D5', 500: '#D99A1E', 700: '#8A5D0A' },
        ink: { 400: '#6B7378', 600: '#434B50', 800: '#222A2E', 900: '#151B1E' },
      },
      fontFamily: {
        sans: ['Roboto', 'system-ui', 'sans-serif'],
        mono: ['"Roboto Mono"', 'ui-monospace', 'monospace'],
      },
      borderRadius: { card: '14px' },
      boxShadow: { card: '0 1px 0 rgba(15,76,92,0.08), 0 6px 18px -10px rgba(15,76,92,0.35)' },
    },
  },
} satisfies Config;
