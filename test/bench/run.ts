/**
 * `npm run bench`: runs every test/bench/*.bench.ts in name order. Each exports
 * `run(): void | Promise<void>` that prints its figures. Benchmarks print; they do not pass or fail.
 */
const benches = import.meta.glob<{ run: () => void | Promise<void> }>('./*.bench.ts', { eager: true });

console.log(`Wetmode benchmarks — node ${process.version}, ${new Date().toISOString()}`);
// WETMODE_BENCH=section,case runs only the benches whose file names contain one of the words.
const only = (process.env.WETMODE_BENCH ?? '').split(',').filter(Boolean);
for (const name of Object.keys(benches).sort()) {
  if (only.length > 0 && !only.some((w) => name.includes(w))) continue;
  console.log(`\n== ${name.replace('./', '')} ==`);
  await benches[name].run();
}
