import { render } from 'preact';
import { App } from './app/App';
import './ui/styles.css';
import { registerServiceWorker } from './pwa/register';
import { installKeepTogether } from './ui/keepTogether';

installKeepTogether();

render(<App />, document.getElementById('app')!);
registerServiceWorker();
