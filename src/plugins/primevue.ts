import type { App } from 'vue';
import PrimeVue from 'primevue/config';
import ToastService from 'primevue/toastservice';
import ConfirmationService from 'primevue/confirmationservice';
import { definePreset } from '@primeuix/themes';
import Aura from '@primeuix/themes/aura';
import '@fontsource/open-sans/latin-400.css';
import '@fontsource/open-sans/latin-600.css';
import 'primeicons/primeicons.css';
import './theme.css';

// Moss for actions, damson for focus and accents, warm paper for surfaces. Components are imported
// where they are used (not registered here) so each lazy route carries only what it shows.
const moss = {
  50: '#f3f6ee', 100: '#e2ead6', 200: '#c6d5b0', 300: '#a3bb85', 400: '#7f9d5c', 500: '#5f7f40',
  600: '#4b6a32', 700: '#3f5d2a', 800: '#334b23', 900: '#283b1c', 950: '#16210f',
};
const paper = {
  0: '#fffdf8', 50: '#f7f3ea', 100: '#efe9dc', 200: '#e4dccb', 300: '#d3c9b4', 400: '#afa48c',
  500: '#8a806b', 600: '#6b6353', 700: '#4f493d', 800: '#37332b', 900: '#24211c', 950: '#15130f',
};

// Aura's severities (success, danger, warn, info) draw on these primitives; remapping them keeps every
// toast, message and tag on our palette instead of mint, pink and lemon.
const brick = {
  50: '#fbf1ee', 100: '#f6dcd5', 200: '#ecbcb0', 300: '#df9483', 400: '#cd6a55', 500: '#b84a34',
  600: '#a3321f', 700: '#8a2616', 800: '#6f2014', 900: '#5a1d13', 950: '#310c07',
};
const ochre = {
  50: '#fcf6ea', 100: '#f7e3bd', 200: '#efcd8f', 300: '#e4b25c', 400: '#d69a37', 500: '#bf7f1f',
  600: '#9c6217', 700: '#7a4a12', 800: '#5f3a12', 900: '#4f3112', 950: '#2d1906',
};
const slate = {
  50: '#f1f5f8', 100: '#e3eaf1', 200: '#c8d6e3', 300: '#a1b9cd', 400: '#7596b2', 500: '#577a98',
  600: '#44627e', 700: '#2f4a62', 800: '#2b3f52', 900: '#273645', 950: '#1a232e',
};

const Spurwood = definePreset(Aura, {
  primitive: { green: moss, emerald: moss, red: brick, yellow: ochre, orange: ochre, amber: ochre, sky: slate, blue: slate },
  semantic: {
    primary: moss,
    focusRing: { width: '3px', style: 'solid', color: '#5b2a45', offset: '2px', shadow: 'none' },
    // Taller fields and buttons: 44 px or more, for gloved or muddy thumbs.
    formField: {
      paddingX: '0.875rem',
      paddingY: '0.625rem',
      borderRadius: '0.5rem',
      focusRing: { width: '0', style: 'none', color: 'transparent', offset: '0', shadow: '0 0 0 3px rgba(63, 93, 42, 0.3)' },
    },
    list: { option: { padding: '0.75rem 0.875rem' } },
    colorScheme: {
      light: {
        surface: paper,
        primary: { color: '{primary.700}', contrastColor: '#ffffff', hoverColor: '{primary.800}', activeColor: '{primary.900}' },
        highlight: { background: '{primary.100}', focusBackground: '{primary.200}', color: '{primary.900}', focusColor: '{primary.950}' },
        text: { color: '{surface.900}', hoverColor: '{surface.950}', mutedColor: '{surface.600}', hoverMutedColor: '{surface.700}' },
        formField: {
          background: '#ffffff',
          borderColor: '{surface.400}',
          hoverBorderColor: '{surface.600}',
          color: '{surface.900}',
          placeholderColor: '{surface.500}',
          invalidBorderColor: '#a3321f',
          invalidPlaceholderColor: '{surface.500}',
        },
        content: { background: '{surface.0}', borderColor: '{surface.200}' },
        mask: { background: 'rgba(36, 33, 28, 0.45)' },
      },
    },
  },
  components: {
    button: {
      root: { label: { fontWeight: '600' }, iconOnlyWidth: '2.75rem' },
      // Aura's greys wash out on paper; secondary actions stay quieter than moss but readable outdoors.
      colorScheme: {
        light: {
          root: { secondary: { background: '{surface.100}', hoverBackground: '{surface.200}', borderColor: '{surface.200}', hoverBorderColor: '{surface.300}', color: '{surface.800}', hoverColor: '{surface.950}' } },
          outlined: { secondary: { hoverBackground: '{surface.100}', activeBackground: '{surface.200}', borderColor: '{surface.400}', color: '{surface.800}' } },
          text: { secondary: { hoverBackground: '{surface.100}', activeBackground: '{surface.200}', color: '{surface.700}' } },
        },
      },
    },
    datatable: {
      headerCell: { padding: '0.75rem 0.875rem', background: '{surface.100}', color: '{surface.800}' },
      bodyCell: { padding: '0.75rem 0.875rem' },
      row: { background: '{surface.0}', hoverBackground: '{primary.50}' },
    },
    dialog: { header: { padding: '1.25rem 1.5rem 0.5rem' }, content: { padding: '0 1.5rem 1.5rem' } },
    tag: {
      root: { fontWeight: '600', padding: '0.25rem 0.6rem' },
      colorScheme: {
        light: {
          success: { background: '{primary.100}', color: '{primary.800}' },
          secondary: { background: '{surface.100}', color: '{surface.700}' },
          contrast: { background: '#5b2a45', color: '#ffffff' },
        },
      },
    },
  },
});

export function installPrimeVue(app: App): void {
  app.use(PrimeVue, {
    ripple: false,
    theme: {
      preset: Spurwood,
      // The app is drawn for daylight on paper; a selector nobody sets keeps the OS dark mode out.
      options: { darkModeSelector: '.spurwood-dark', cssLayer: { name: 'primevue', order: 'theme, base, primevue' } },
    },
  });
  app.use(ToastService);
  app.use(ConfirmationService);
}
