/** `npm run bench`: speed figures, printed, never asserted. Needs the local database for the HTTP part. */
import { run as http } from './http';
import { run as thermal } from './thermal';
import { run as bellDelaware } from './bell-delaware';

console.log(`Bundlesmith benchmarks on ${(await import('node:os')).cpus().length} cores, Node ${process.version}\n`);
thermal();
bellDelaware();
await http();
