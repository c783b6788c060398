// Only the Latin subsets (basic and extended) of the three faces ship; a character outside them (Greek
// symbols such as λ, χ, ψ) falls back to the next font of the stack in styles.css.
import '@fontsource/source-serif-4/latin-400.css';
import '@fontsource/source-serif-4/latin-ext-400.css';
import '@fontsource/source-serif-4/latin-600.css';
import '@fontsource/source-serif-4/latin-ext-600.css';
import '@fontsource/public-sans/latin-400.css';
import '@fontsource/public-sans/latin-ext-400.css';
import '@fontsource/public-sans/latin-500.css';
import '@fontsource/public-sans/latin-ext-500.css';
import '@fontsource/public-sans/latin-600.css';
import '@fontsource/public-sans/latin-ext-600.css';
import '@fontsource/public-sans/latin-700.css';
import '@fontsource/public-sans/latin-ext-700.css';
import '@fontsource/public-sans/latin-400-italic.css';
import '@fontsource/public-sans/latin-ext-400-italic.css';
import '@fontsource/ibm-plex-mono/latin-400.css';
import '@fontsource/ibm-plex-mono/latin-ext-400.css';
import '@fontsource/ibm-plex-mono/latin-500.css';
import '@fontsource/ibm-plex-mono/latin-ext-500.css';
import './styles.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { startOffline } from './app/offline';
import { AppProviders } from './app/providers';
import { createQueryClient } from './app/query-client';

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

const queryClient = createQueryClient();
void startOffline(queryClient).finally(() =>
  createRoot(root).render(
    <StrictMode>
      <AppProviders queryClient={queryClient} />
    </StrictMode>,
  ),
);
