// The client's presentation page wrapped in its own query cache, for its own entry and inside the app.
import { QueryClientProvider } from '@tanstack/react-query';
import { useState } from 'react';
import { createPresentationQueryClient } from './api/presentation';
import { PresentationPage } from './components/presentation-page';

/** The whole client page with its own query cache: the same on its own entry and inside the app. */
export function PresentationApp({ token }: { token: string }) {
  const [client] = useState(createPresentationQueryClient);
  return (
    <QueryClientProvider client={client}>
      <PresentationPage token={token} />
    </QueryClientProvider>
  );
}
