import '@fontsource/ibm-plex-sans/400.css';
import '@fontsource/ibm-plex-sans/500.css';
import '@fontsource/ibm-plex-sans/600.css';
import '@fontsource/jetbrains-mono/400.css';
import '@fontsource/jetbrains-mono/500.css';
import './index.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { AppProvider } from './app/provider';
import { AppRouter } from './app/router';
import { meQueryKey } from './lib/viewer';
import { createQueryClient } from './lib/query-client';

const queryClient = createQueryClient({
  // The answer said the session is not what the page believed: ask again who is signed in.
  onSessionChanged: (client) => void client.invalidateQueries({ queryKey: meQueryKey }),
});

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

createRoot(root).render(
  <StrictMode>
    <AppProvider queryClient={queryClient}>
      <AppRouter queryClient={queryClient} />
    </AppProvider>
  </StrictMode>,
);
