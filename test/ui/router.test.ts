import { describe, it, expect } from 'vitest';
import { parseHash, hashFor, MAIN_SCREENS } from '../../src/ui/shell/router';

describe('hash router', () => {
  it('an empty hash opens the Cases screen', () => {
    expect(parseHash('')).toEqual({ screen: 'cases' });
    expect(parseHash('#')).toEqual({ screen: 'cases' });
  });
  it('each main screen round-trips through its hash', () => {
    for (const s of MAIN_SCREENS) expect(parseHash(hashFor(s.id))).toEqual({ screen: s.id });
  });
  it('the four main screens are Cases, Member, Results and Report, in that order', () => {
    expect(MAIN_SCREENS.map((s) => s.label)).toEqual(['Cases', 'Member', 'Results', 'Report']);
  });
  it('an unknown screen falls back to Cases rather than a blank page', () => {
    expect(parseHash('#/nowhere')).toEqual({ screen: 'cases' });
  });
  it('a shared-case link keeps its whole payload', () => {
    expect(parseHash('#/open/AbC-_x.y')).toEqual({ screen: 'open', payload: 'AbC-_x.y' });
  });
});
