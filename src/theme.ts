import { definePreset } from '@primeuix/themes';
import base from '@primeuix/themes/aura/base';
import button from '@primeuix/themes/aura/button';
import css from '@primeuix/themes/aura/css';
import message from '@primeuix/themes/aura/message';
import skeleton from '@primeuix/themes/aura/skeleton';
import tooltip from '@primeuix/themes/aura/tooltip';

/**
 * The design tokens of the PrimeVue components the public pages use: the whole Aura set is most
 * of the entry chunk, so a visitor's phone gets these and the router adds the rest (theme-all.ts)
 * before any other page. A public page that uses another component must add it here
 * (tests/unit/public-code.test.ts fails until it does).
 */
export const PUBLIC_COMPONENT_TOKENS = { button, message, skeleton, tooltip };
// aura/css's default export is the CSS string its index.d.ts calls a named `css`
const Aura = { ...base, components: PUBLIC_COMPONENT_TOKENS, css: css as unknown as string };

/** Our palette: harbour blue for actions, brass for accents, warm paper for the page. */
export const ShipkeeperTheme = definePreset(Aura, {
  semantic: {
    primary: {
      50: '#eef5f7',
      100: '#d3e4ea',
      200: '#a9c9d4',
      300: '#77a7b7',
      400: '#4a8497',
      500: '#2c6779',
      600: '#1f4e5f',
      700: '#1a4150',
      800: '#163541',
      900: '#112a34',
      950: '#0a1a20',
    },
    focusRing: { width: '2px', style: 'solid', color: '#b8860b', offset: '2px' },
    colorScheme: {
      light: {
        primary: { color: '{primary.600}', contrastColor: '#ffffff', hoverColor: '{primary.700}', activeColor: '{primary.800}' },
        surface: {
          0: '#ffffff',
          50: '#f8f6f1',
          100: '#efebe2',
          200: '#e1dbcf',
          300: '#cbc3b4',
          400: '#a49c8e',
          500: '#7d766a',
          600: '#5e584f',
          700: '#45413b',
          800: '#2f2d29',
          900: '#1f1e1b',
          950: '#121110',
        },
      },
    },
  },
});
