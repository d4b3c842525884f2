import { render } from 'preact';
import { App } from './ui/App';
import './ui/styles.css';
import { openDeviceStoreOnce } from './ui/state/early-store';

void openDeviceStoreOnce(); // under way while the first paint is made

render(<App />, document.getElementById('app')!);
