import { render } from 'preact';

/** Placeholder first screen; the shop-floor screens replace it. */
function App() {
  return <main><h1>Casefront</h1></main>;
}

render(<App />, document.getElementById('app')!);
