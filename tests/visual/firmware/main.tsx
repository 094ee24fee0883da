import '@fontsource/source-sans-3/400.css';
import '@fontsource/source-sans-3/600.css';
import '@fontsource/source-sans-3/700.css';
import '@fontsource/fira-code/400.css';
import '@fontsource/fira-code/500.css';
import './harness.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { Harness } from './harness';

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <Harness />
  </StrictMode>,
);
