import { options, render } from 'preact';
import { App } from './app/App';
import './ui/styles.css';
import { registerServiceWorker } from './pwa/register';
import { installKeepTogether } from './ui/keepTogether';

installKeepTogether();

// A state change is drawn in a task of its own, not at the end of the event that made it (Preact's
// default, a microtask). A key typed in a field then costs the browser's own work and the field's echo;
// the screen's new answer follows in the next task. On a slow phone the two together made one task too
// long for the field to keep up with the thumb.
options.debounceRendering = (flush) => setTimeout(flush, 0);

render(<App />, document.getElementById('app')!);
registerServiceWorker();
