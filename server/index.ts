import { startServer } from './boot';
import { ConfigError, loadConfig, type Config } from './config/env';

let config: Config;
try {
  config = loadConfig();
} catch (err) {
  if (err instanceof ConfigError) {
    console.error(err.message);
    process.exit(1);
  }
  throw err;
}

const running = await startServer(config);
running.logger.info(`Shoalwise listening on ${running.url}`);

let stopping = false;
function shutdown(signal: string): void {
  if (stopping) return;
  stopping = true;
  running.logger.info({ signal }, 'shutting down');
  setTimeout(() => process.exit(1), 10_000).unref();
  void running.close().then(() => process.exit(0));
}
process.on('SIGTERM', () => shutdown('SIGTERM'));
process.on('SIGINT', () => shutdown('SIGINT'));
