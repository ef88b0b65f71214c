import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './App';
import { startFieldEngine } from './engine/fieldEngine';
import { startPlayback } from './engine/playback';
import { openStartingScenario, startKeepingWork } from './io/work';
import { appStore } from './store/appStore';
import './styles.css';

const root = document.getElementById('root');
if (root === null) throw new Error('index.html has no #root element');

// Started outside React so StrictMode's double effects cannot fetch twice or make two pools.
startFieldEngine(appStore);
startPlayback(appStore);
startKeepingWork();
void openStartingScenario();

createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
