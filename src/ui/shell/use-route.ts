import { useLayoutEffect, useState } from 'preact/hooks';
import { parseHash, type Route } from './router';

/** The current hash route, following back/forward and link clicks. */
export function useRoute(): Route {
  const [route, setRoute] = useState<Route>(() => parseHash(location.hash));
  // A layout effect subscribes before the first paint, and the hash is read again once subscribed: a hash changed
  // between the first render and the subscription (a quick tap as the first screen appears) would otherwise be
  // missed, leaving the screen on the old route for good.
  useLayoutEffect(() => {
    const onChange = () => {
      const next = parseHash(location.hash);
      setRoute((shown) => (sameRoute(shown, next) ? shown : next));
    };
    addEventListener('hashchange', onChange);
    onChange();
    return () => removeEventListener('hashchange', onChange);
  }, []);
  return route;
}

function sameRoute(a: Route, b: Route): boolean {
  return a.screen === b.screen && (a.screen !== 'open' || (b.screen === 'open' && a.payload === b.payload));
}
