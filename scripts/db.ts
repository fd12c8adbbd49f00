// `npm run db:start` / `npm run db:stop`: the private PostgreSQL cluster on its own.
import { loadConfig, runMain, ConfigError } from './lib/config.ts';
import { APP_DATABASE, TEST_DATABASE, clusterDir, connectionUrl, ensureDatabase, startCluster, stopCluster } from './lib/postgres.ts';

runMain(async () => {
	const config = loadConfig();
	const action = process.argv[2];
	if (config.databaseUrl) {
		console.log('DATABASE_URL is set: using that server, starting nothing.');
		return;
	}
	if (action === 'start') {
		const { started, pid } = await startCluster(config);
		console.log(started ? `PostgreSQL started (pid ${pid}) on 127.0.0.1:${config.pgPort}` : `PostgreSQL already running (pid ${pid})`);
		await ensureDatabase(config, APP_DATABASE);
		await ensureDatabase(config, TEST_DATABASE);
		console.log(`app:  ${connectionUrl(config, APP_DATABASE)}\ntest: ${connectionUrl(config, TEST_DATABASE)}\ndata: ${clusterDir(config)}`);
	} else if (action === 'stop') {
		console.log((await stopCluster(config)) ? 'PostgreSQL stopped' : 'PostgreSQL was not running');
	} else {
		throw new ConfigError('db', `unknown action ${JSON.stringify(action)}; use start or stop`);
	}
});
