// The client's entry: no router, no session, no designer code; the token comes from /p/<token>.
import '../../lib/zod-no-eval';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import '../../styles.css';
import { PresentationApp } from './presentation-app';

const token = decodeURIComponent(window.location.pathname.replace(/^\/p\//, '').split('/')[0] ?? '');

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <PresentationApp token={token} />
  </StrictMode>,
);
