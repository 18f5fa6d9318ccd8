import { options, render } from 'preact';
import { App } from './app/App';
import './ui/styles.css';
import { registerServiceWorker } from './pwa/register';
import { installKeepTogether } from './ui/keepTogether';

installKeepTogether();

// What a key typed in a field changes is drawn in a task of its own, not at the end of the input event
// (Preact's default, a microtask). The key's own task is then the browser's echo of it, and the new
// answer follows in the next task: on a slow phone the two together made one task too long for the
// field to keep up with the thumb. Every other change (a tap, a choice, a result from the worker) is
// drawn at once, as before.
options.debounceRendering = (flush) => {
  if (window.event?.type === 'input') setTimeout(flush, 0);
  else void Promise.resolve().then(flush);
};

render(<App />, document.getElementById('app')!);
registerServiceWorker();
