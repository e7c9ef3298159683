/**
 * The API server on its own (compiled to dist/server/main.js): configuration, database
 * migrations, listen. `npm start` wraps this with PostgreSQL, the fakes and the demo seed.
 */
import { fileURLToPath } from 'node:url';
import { loadConfig } from './config.js';
import { runServer } from './server.js';

const clientDir = fileURLToPath(new URL('../client', import.meta.url));
const running = await runServer({ config: loadConfig(), clientDir });
console.log(`Ebbroot API listening on ${running.url}`);

for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.once(signal, () => {
    void running.close().then(() => process.exit(0));
  });
}
