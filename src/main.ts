import '@fontsource/source-sans-3/400.css';
import '@fontsource/source-sans-3/600.css';
import '@fontsource/source-sans-3/700.css';
import './styles.css';

import { createPinia } from 'pinia';
import { createApp } from 'vue';
import App from './app.vue';
import { onUnauthorized } from './api/http';
import { router } from './router';
import { useSessionStore } from './stores/session';

const app = createApp(App);
const pinia = createPinia();
app.use(pinia);
app.use(router);

// A 401 from any call but `me`/`login` means the session ended on the server: forget the user
// and send them to sign in, coming back to where they were afterwards.
onUnauthorized(() => {
  useSessionStore(pinia).clear();
  const current = router.currentRoute.value;
  if (current.meta.public) return;
  void router.replace({ name: 'sign-in', query: { next: current.fullPath } });
});

app.mount('#app');
