import { useState } from 'react';
import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { queryClient } from '../lib/query-client';
import { AppProvider } from './provider';
import { createRoutes } from './router';

function AppRouter() {
  // Created only after the session gate opens, so the first loaders already hold a token.
  const [router] = useState(() => createBrowserRouter(createRoutes(queryClient)));
  return <RouterProvider router={router} />;
}

export function App() {
  return (
    <AppProvider queryClient={queryClient}>
      <AppRouter />
    </AppProvider>
  );
}
