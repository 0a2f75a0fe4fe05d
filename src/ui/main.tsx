import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import '@xyflow/react/dist/style.css';
import './styles.css';
import { App } from './App.tsx';
import { startEditor } from './files/startup.ts';

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');
// Open the autosaved project (or the demo) before the first render, so the canvas fits it at once.
void startEditor().finally(() =>
  createRoot(root).render(
    <StrictMode>
      <App />
    </StrictMode>,
  ),
);
