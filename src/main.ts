import { createApp } from 'vue';
import { createPinia } from 'pinia';
import '@fontsource/nunito/400.css';
import '@fontsource/nunito/600.css';
import '@fontsource/nunito/700.css';
import '@fontsource/nunito/800.css';
import './styles/theme.css';
import './styles/element-overrides.css';
import App from './App.vue';
import { createAppRouter } from './router';

const app = createApp(App);
app.use(createPinia());
// The router's first navigation loads the session (see router/guards.ts) before any page renders.
app.use(createAppRouter());
app.mount('#app');
