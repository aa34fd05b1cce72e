/** The shell: header, the routed screen, the update prompt and the bottom navigation. */
import { useEffect, useRef } from 'preact/hooks';
import { UpdatePrompt } from '../../pwa/UpdatePrompt';
import { Header } from './Header';
import { Nav } from './Nav';
import { route } from './route';
import { ScreenView } from './ScreenView';
import './shell.css';

export function App() {
  const id = route.value;
  const first = useRef(true);
  useEffect(() => {
    // After a navigation (not the first paint) move focus to the new screen's heading for keyboard and screen-reader users.
    if (first.current) {
      first.current = false;
      return;
    }
    window.scrollTo(0, 0);
    const timer = setTimeout(() => document.querySelector<HTMLElement>('main h1')?.focus(), 0);
    return () => clearTimeout(timer);
  }, [id]);
  return (
    <div class="shell">
      <Header />
      <UpdatePrompt />
      <main id="main">
        <ScreenView id={id} />
      </main>
      <Nav />
    </div>
  );
}
