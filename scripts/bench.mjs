// `npm run bench:sync` (and later benchmarks): build, make a fresh benchmark database, run one.
import { bin, databaseUrl, ensureDebianPackage, ensureDependencies, run, startDatabase } from './lib.mjs';

const name = process.argv[2];
if (!name) throw new Error('usage: node scripts/bench.mjs <name>   (e.g. sync)');
ensureDependencies();
if (name === 'load') ensureDebianPackage('/usr/sbin/nginx', 'nginx'); // it runs the cluster behind nginx
startDatabase();
run('bash', ['scripts/db.sh', 'fresh-db', 'lamplight_bench']);
run(bin('tsc'), ['-p', 'sync-server/tsconfig.json']);
run('node', [`dist/node/scripts/${name.startsWith('chaos') ? name : `bench-${name}`}.js`, ...process.argv.slice(3)], {
  env: { ...process.env, DATABASE_URL: databaseUrl('lamplight_bench') },
});
