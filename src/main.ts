import './assets/fonts.css';
import 'primeicons/primeicons.css';
import './assets/base.css';

import { PiniaColada } from '@pinia/colada';
import { createPinia } from 'pinia';
import PrimeVue from 'primevue/config';
import ConfirmationService from 'primevue/confirmationservice';
import ToastService from 'primevue/toastservice';
import Tooltip from 'primevue/tooltip';
import { createApp } from 'vue';
import App from './App.vue';
import { router } from './router';
import { ShipkeeperTheme } from './theme';

const app = createApp(App);
app.use(createPinia());
app.use(PiniaColada, { queryOptions: { staleTime: 10_000 } });
app.use(router);
app.use(PrimeVue, { theme: { preset: ShipkeeperTheme, options: { darkModeSelector: '.sk-dark' } } });
app.use(ToastService);
app.use(ConfirmationService);
app.directive('tooltip', Tooltip);
app.mount('#app');
