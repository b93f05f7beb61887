import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router';
import { z } from 'zod';
import { AppProviders } from './app/providers';
import { router } from './app/router';
import { installFormMessages } from './lib/zod-messages';
import './styles/index.css';

// The server's Content-Security-Policy forbids eval: without this, zod probes `new Function`
// once (and falls back), which the browser reports as a CSP violation.
z.config({ jitless: true });
installFormMessages();

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

createRoot(root).render(
  <StrictMode>
    <AppProviders>
      <RouterProvider router={router} />
    </AppProviders>
  </StrictMode>,
);
