/** Entry: restore settings, apply theme and language, render the shell, register the service worker. */
import { render } from 'preact';
import { registerServiceWorker } from '../pwa/register';
import { applyToDocument, loadInitialLanguage } from './settings/state';
import { App } from './shell/App';
import { followHash } from './shell/route';
import './ui/base.css';
import './ui/ui.css';

applyToDocument();
followHash();
void loadInitialLanguage().then(() => {
  render(<App />, document.getElementById('app')!);
  registerServiceWorker();
});
