/** The boot's guess of the first solve: the last request answered on this device, else the demo case's. */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { likelyFirstRequest, rememberRequest } from '../../../src/ui/state/first-request';
import { caseFromDemo } from '../../../src/app/create-case';
import { readCase, requestOf } from '../../../src/app/read-case';
import { DEMO_CASES } from '../../../src/kinds/registry';
import { memoryStorage } from '../../helpers/memory-storage';

function demoRequest() {
  const r = readCase(caseFromDemo(DEMO_CASES[0]));
  if (!r.ok) throw new Error('the first demo case must read');
  return requestOf(r);
}

afterEach(() => vi.unstubAllGlobals());

describe('the likeliest first request', () => {
  it('on a device with nothing kept it is the demo case the first start opens', () => {
    vi.stubGlobal('localStorage', memoryStorage());
    expect(JSON.stringify(likelyFirstRequest())).toBe(JSON.stringify(demoRequest()));
  });

  it('after an answer it is the request last answered, as the same JSON text', () => {
    vi.stubGlobal('localStorage', memoryStorage());
    const other = readCase(caseFromDemo(DEMO_CASES[2]));
    if (!other.ok) throw new Error('demo must read');
    rememberRequest(requestOf(other));
    expect(JSON.stringify(likelyFirstRequest())).toBe(JSON.stringify(requestOf(other)));
  });

  it('without localStorage (or with a broken entry) it still guesses the demo and never throws', () => {
    const broken = memoryStorage();
    broken.setItem('wetmode-last-request', '{not json');
    vi.stubGlobal('localStorage', broken);
    expect(JSON.stringify(likelyFirstRequest())).toBe(JSON.stringify(demoRequest()));
    vi.stubGlobal('localStorage', undefined);
    expect(() => rememberRequest(demoRequest())).not.toThrow();
  });
});
