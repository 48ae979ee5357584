import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from '@/app/app';
import './styles.css';

const rootElement = document.getElementById('root');
if (!rootElement) throw new Error('Pinfield could not start: the page has no #root element.');

createRoot(rootElement).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
