/**
 * Entry of the Hingeline workspace (Electron renderer and the browser build alike): styles and
 * fonts, Pinia and the application.
 */
import { createPinia } from 'pinia';
import { createApp } from 'vue';
import App from './App.vue';
import { perfMark } from './components/ids.ts';
import { loadFonts } from './fonts.ts';
import './styles/base.css';
import './styles/editor.css';

void loadFonts();
const app = createApp(App);
app.use(createPinia());
app.mount('#app');
document.documentElement.dataset.ready = 'true';
perfMark('hl:interactive');
