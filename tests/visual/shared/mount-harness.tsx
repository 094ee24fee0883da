import '@fontsource/source-sans-3/400.css';
import '@fontsource/source-sans-3/600.css';
import '@fontsource/source-sans-3/700.css';
import '@fontsource/fira-code/400.css';
import '@fontsource/fira-code/500.css';
import { StrictMode, type ComponentType } from 'react';
import { createRoot } from 'react-dom/client';

/** Renders a harness page with the app's fonts, the way src/main.tsx renders the app. */
export function mountHarness(Harness: ComponentType) {
  createRoot(document.getElementById('root')!).render(
    <StrictMode>
      <Harness />
    </StrictMode>,
  );
}
