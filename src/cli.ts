/**
 * The `wetmode` command: the same physics as the app, on case files, for office batch work and checks.
 */
import { main } from './cli/main';

process.exitCode = await main(process.argv.slice(2), (s) => process.stdout.write(s + '\n'), (s) => process.stderr.write(s + '\n'));
