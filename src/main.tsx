import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import '@fontsource/space-grotesk/400.css';
import '@fontsource/space-grotesk/500.css';
import '@fontsource/space-grotesk/600.css';
import '@fontsource/space-grotesk/700.css';
import './styles.css';
import { App } from '@/app/App';

const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element to mount Slotwise into.');

createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
