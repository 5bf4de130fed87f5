// First: zod must not probe for eval under the Content-Security-Policy (see the module).
import '@/persistence/zod-without-eval';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from '@/app/App';
import { registerServiceWorker } from '@/app/register-sw';
import '@/app/app.css';

const root = document.getElementById('root');
if (!root) throw new Error('Saltsmith: #root element missing from index.html');
createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
registerServiceWorker();
