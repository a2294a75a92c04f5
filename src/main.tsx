import '@fontsource/ibm-plex-sans/latin-400.css';
import '@fontsource/ibm-plex-sans/latin-500.css';
import '@fontsource/ibm-plex-sans/latin-600.css';
import '@fontsource/ibm-plex-sans/latin-ext-400.css';
import '@fontsource/ibm-plex-sans/latin-ext-600.css';
import '@fontsource/ibm-plex-mono/latin-400.css';
import '@fontsource/ibm-plex-mono/latin-500.css';
import './index.css';

import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { AppProvider } from './app/provider.tsx';
import { createQueryClient } from './app/query-client.ts';
import { createAppRouter } from './app/router.tsx';
import { bindCsrfToSession } from './features/auth/api/bind-csrf.ts';

const queryClient = createQueryClient();
bindCsrfToSession(queryClient);
const router = createAppRouter(queryClient);

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

createRoot(root).render(
  <StrictMode>
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  </StrictMode>,
);
