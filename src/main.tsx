import { QueryClientProvider } from '@tanstack/react-query';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router';
import { router } from './app/router';
import { LocaleSync } from './lib/locale-sync';
import './lib/i18n';
import { queryClient } from './lib/query-client';
import './styles/index.css';

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <QueryClientProvider client={queryClient}>
      <LocaleSync />
      <RouterProvider router={router} />
    </QueryClientProvider>
  </StrictMode>,
);
