import { render } from 'preact';
import { App } from './ui/App';
import './ui/styles.css';
import { bootOnce } from './ui/state/early-boot';
import { parseHash } from './ui/shell/router';
import { markOnce } from './ui/state/boot-marks';

/**
 * The worker, the device store and the first case start before the UI mounts (see early-boot.ts). The UI mounts
 * once the first case is open (its solve already under way), so the first paint is the screen that case opens on,
 * drawn once with the store in hand, rather than a moment of the Cases list drawn and then redrawn; a store slow
 * to open holds the first paint back by at most MOUNT_WAIT_MS.
 */
const MOUNT_WAIT_MS = 400;

markOnce('wetmode:script-start');
const boot = bootOnce(parseHash(location.hash).screen === 'open');
const mount = () => {
  markOnce('wetmode:mount');
  render(<App />, document.getElementById('app')!);
};
// The first case opened before the store (see early-boot.ts): the UI mounts now, its answer drawn as soon as the
// worker has it; the store, once open, replaces that case only if it holds other work to reopen. A task later, not
// now: the solver worker, just created, starts only once this task has ended (its script then loads on its own
// thread while the UI renders).
void boot.openedEarly.then((early) => {
  if (early) setTimeout(mount, 0);
  else void Promise.race([boot.outcome, new Promise((resolve) => setTimeout(resolve, MOUNT_WAIT_MS))]).then(mount);
});
