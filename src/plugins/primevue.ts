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

const Spurwood = definePreset(Aura, {
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
          invalidPlaceholderColor: '#a3321f',
        },
        content: { background: '{surface.0}', borderColor: '{surface.200}' },
        mask: { background: 'rgba(36, 33, 28, 0.45)' },
      },
    },
  },
  components: {
    button: { root: { label: { fontWeight: '600' }, iconOnlyWidth: '2.75rem' } },
    datatable: {
      headerCell: { padding: '0.875rem 1rem', background: '{surface.100}', color: '{surface.800}' },
      bodyCell: { padding: '0.875rem 1rem' },
      row: { background: '{surface.0}', hoverBackground: '{primary.50}' },
    },
    dialog: { header: { padding: '1.25rem 1.5rem 0.5rem' }, content: { padding: '0 1.5rem 1.5rem' } },
    tag: { root: { fontWeight: '600', padding: '0.25rem 0.6rem' } },
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
