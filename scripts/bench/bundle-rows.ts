// `npx tsx scripts/bench/bundle-rows.ts`: only the bundle download's before/after rows of `npm run bench` (a minute
// rather than the whole core table), printed, not written.
import { bundleRows } from './core.ts';

for (const r of await bundleRows()) console.log(`| ${r.work} | ${r.ours.toFixed(0)} ${r.unit} | ${r.floor.toFixed(0)} ${r.unit} | ${r.floorName} | ${r.ratio.toFixed(1)}× | ${r.target} | ${r.pass ? 'yes' : 'NO'} |`);
