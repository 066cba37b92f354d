import '@client/lib/strict-csp';
import '@fontsource/nunito/400.css';
import '@fontsource/nunito/600.css';
import '@fontsource/nunito/700.css';
import '@fontsource/nunito/800.css';
import '@client/styles/index.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from '@client/app/app';

const root = document.getElementById('root');
if (!root) throw new Error('index.html lacks #root');
createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
