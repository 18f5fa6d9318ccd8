import { render } from 'preact';
import { App } from './app/App';
import './ui/styles.css';

render(<App />, document.getElementById('app')!);
