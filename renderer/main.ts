/** Renderer entry: the main screen, or the schedule page at `#/schedule` (print window). */
import { createApp } from 'vue';
import { createPinia } from 'pinia';
import App from './App.vue';
import PrintScheduleApp from './schedule/PrintScheduleApp.vue';
import './styles/base.css';

const root = window.location.hash.startsWith('#/schedule') ? PrintScheduleApp : App;
createApp(root).use(createPinia()).mount('#app');
