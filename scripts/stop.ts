// `npm run stop`: ends what `npm start` launched — the server, the job worker, the mail fake and the private cluster.
import { loadConfig, runMain } from './lib/config.ts';
import { stopCluster } from './lib/postgres.ts';
import { stopBackground } from './lib/services.ts';

runMain(async () => {
	const config = loadConfig();
	if (await stopBackground(config, 'app')) console.log('server stopped');
	if (await stopBackground(config, 'worker')) console.log('job worker stopped');
	if (await stopBackground(config, 'mail')) console.log('mail fake stopped');
	if (!config.databaseUrl && (await stopCluster(config))) console.log('PostgreSQL stopped');
});
