import { render } from 'preact';
import { App } from './ui/App';
import './ui/styles.css';
import { answeredOr, bootOnce } from './ui/state/early-boot';
import { parseHash } from './ui/shell/router';
import { markOnce } from './ui/state/boot-marks';

/**
 * The worker, the device store and the first case start before the UI mounts (see early-boot.ts). The UI mounts
 * once the first case is open (its solve already under way), so the first paint is the screen that case opens on,
 * drawn once with the store in hand, rather than a moment of the Cases list drawn and then redrawn; a store slow
 * to open holds the first paint back by at most MOUNT_WAIT_MS.
 */
const MOUNT_WAIT_MS = 400;
/** Longest the UI waits for the answer of a case opened before the store: a slow solve must not hide the screen. */
const MOUNT_WAITS_FOR_ANSWER_MS = 300;

markOnce('wetmode:script-start');
const boot = bootOnce(parseHash(location.hash).screen === 'open');
const mount = () => {
  markOnce('wetmode:mount');
  render(<App />, document.getElementById('app')!);
};
// The first case opened before the store (see early-boot.ts): the UI mounts once its answer is in, so the first
// paint holds the answer (drawn once, and the solver worker has the processor to itself meanwhile), or after
// MOUNT_WAITS_FOR_ANSWER_MS with the answer still on its way. The store, once open, replaces that case only if it
// holds other work to reopen.
void boot.openedEarly.then((early) => {
  if (early) void answeredOr(boot.services.model, MOUNT_WAITS_FOR_ANSWER_MS).then(mount);
  else void Promise.race([boot.outcome, new Promise((resolve) => setTimeout(resolve, MOUNT_WAIT_MS))]).then(mount);
});
