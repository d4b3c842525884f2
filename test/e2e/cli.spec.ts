import { test, expect } from '@playwright/test';
import { spawnSync } from 'node:child_process';
import pkg from '../../package.json' with { type: 'json' };

// The built `wetmode` command (npm run build writes dist-cli/wetmode.js, the package's bin).
function wetmode(args: string[], input?: string) {
  const r = spawnSync(process.execPath, ['dist-cli/wetmode.js', ...args], { input, encoding: 'utf8' });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

test('the built wetmode command answers --version and --help', () => {
  expect(wetmode(['--version'])).toEqual({ code: 0, out: `${pkg.version}\n`, err: '' });
  const help = wetmode(['--help']);
  expect(help.code).toBe(0);
  expect(help.out).toContain('Cautions:');
});
