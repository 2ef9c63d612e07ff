import type { Config } from 'tailwindcss';

// Phosforge palette: "slate ink" neutrals, an amber "ember" accent (phosphor glow),
// and a cool "pump" blue for the LED chip. Status colours for pass / hold / fail.
export default {
  content: ['./src/**/*.{html,js,svelte,ts}'],
  theme: {
    extend: {
      colors: {
        ink: {
          50: '#f5f6f8',
          100: '#e9ecf1',
          200: '#cfd5df',
          300: '#a8b2c3',
          400: '#7a879e',
          500: '#58657d',
          600: '#434e64',
          700: '#343d50',
          800: '#252c3b',
          900: '#171c27'
        },
        ember: {
          50: '#fff8eb',
          100: '#feecc7',
          200: '#fdd78a',
          300: '#fbbd4d',
          400: '#f9a324',
          500: '#e9820b',
          600: '#c55f06',
          700: '#9c4309',
          800: '#7f360f',
          900: '#692e10'
        },
        pump: {
          50: '#eef4ff',
          100: '#dbe6fe',
          200: '#bfd2fe',
          300: '#93b4fd',
          400: '#608cfa',
          500: '#3b66f5',
          600: '#2547ea',
          700: '#1d35d7',
          800: '#1e2dae',
          900: '#1e2b89'
        },
        pass: '#1f7a4d',
        hold: '#b7791f',
        fail: '#b42318'
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif']
      }
    }
  }
} satisfies Config;
