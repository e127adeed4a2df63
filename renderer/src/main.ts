// PLACEHOLDER entry written with the desktop shell so the builds have something to bundle.
// The renderer workspace replaces this file (and App.vue) with the real application.
import { createApp } from 'vue';
import App from './App.vue';

createApp(App).mount('#app');
