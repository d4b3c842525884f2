import { describe, it, expect } from 'vitest';
import { main } from '../../src/cli/main';
import pkg from '../../package.json' with { type: 'json' };

async function run(args: string[]) {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(args, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

describe('wetmode command line', () => {
  it('--version prints the package version and exits 0', async () => {
    expect(await run(['--version'])).toEqual({ code: 0, out: pkg.version, err: '' });
  });
  it('--help lists usage and the cautions', async () => {
    const r = await run(['--help']);
    expect(r.code).toBe(0);
    expect(r.out).toContain('Usage:');
    expect(r.out).toContain('not a design approval');
    expect(r.out).toContain('qualified engineer');
  });
  it('no arguments prints help and exits 2 (usage error)', async () => {
    const r = await run([]);
    expect(r.code).toBe(2);
    expect(r.out).toContain('Usage:');
  });
  it('an unknown command says what was expected and exits 2', async () => {
    const r = await run(['frobnicate']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('unknown command "frobnicate"');
  });
});
