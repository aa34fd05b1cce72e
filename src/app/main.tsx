/** Entry: restore settings, apply theme and language, render the shell, register the service worker. */
import { render } from 'preact';
import { language } from '../i18n/useT';
import { registerServiceWorker } from '../pwa/register';
import { applyToDocument, loadInitialLanguage } from './settings/state';
import { App } from './shell/App';
import { followHash } from './shell/route';
import './ui/base.css';
import './ui/ui.css';

applyToDocument();
followHash();
/**
 * The first Intl object of a page loads ICU's data: about 90 ms on a 4× slowed CPU. Numbers are
 * formatted without Intl, but plural rules (i18next) and the log's dates need it: it is loaded
 * right after the first screen is drawn, so no tap or keystroke later pays for it.
 */
function loadIntlData(): void {
  const lang = language.peek();
  new Intl.PluralRules(lang).select(1);
  new Intl.DateTimeFormat(lang).format(0);
}

void loadInitialLanguage().then(() => {
  render(<App />, document.getElementById('app')!);
  registerServiceWorker();
  setTimeout(loadIntlData, 0);
});
