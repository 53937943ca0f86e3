import type { Config } from 'tailwindcss'

// A calm deep-water palette: "tide" blues for structure, "kelp" for done/ok,
// one warm "ember" accent for watch and one strong "alarm" accent for critical.
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        tide: {
          50: '#eef6f8',
          100: '#d5e9ee',
          200: '#aed3dd',
          300: '#7cb6c6',
          400: '#4d93a9',
          500: '#31768e',
          600: '#265f75',
          700: '#214e60',
          800: '#1d4150',
          900: '#142e3a',
          950: '#0b1d26',
        },
        kelp: { 50: '#eef8f1', 100: '#d4efdc', 500: '#2f8a57', 600: '#24703f', 700: '#1d5a33' },
        ember: { 50: '#fff6e8', 100: '#feeac6', 500: '#c7781a', 600: '#a55f0f', 700: '#854b0c' },
        alarm: { 50: '#fdeff0', 100: '#fad6d9', 500: '#c62839', 600: '#a71d2e', 700: '#861726' },
      },
      fontFamily: { sans: ['Figtree', 'system-ui', 'sans-serif'] },
    },
  },
} satisfies Config
