import { render } from 'preact';
import { App } from './ui/App';
import './ui/styles.css';
import { bootOnce } from './ui/state/early-boot';
import { parseHash } from './ui/shell/router';

/**
 * The worker, the device store and the first case start before the UI mounts (see early-boot.ts). The UI mounts
 * once the first case is open, so its first paint is the screen that case opens on (already solving) rather than
 * a moment of the Cases list; a store slow to open delays that first paint by at most MOUNT_WAIT_MS.
 */
const MOUNT_WAIT_MS = 400;

const boot = bootOnce(parseHash(location.hash).screen === 'open');
const mount = () => render(<App />, document.getElementById('app')!);
void Promise.race([boot.outcome, new Promise((resolve) => setTimeout(resolve, MOUNT_WAIT_MS))]).then(mount);
