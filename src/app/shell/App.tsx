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
  const firstRenderRef = useRef(true);
  useEffect(() => {
    // A new screen starts at its top (focus moves to its heading in ScreenView).
    if (firstRenderRef.current) firstRenderRef.current = false;
    else window.scrollTo(0, 0);
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
