import { loadConfig } from './config';
import { startServer } from './start';

const dev = process.argv.includes('--dev');
const config = loadConfig(process.env, dev ? { env: 'development' } : {});
const server = await startServer(config, { dev });

const url = `http://${config.host === '0.0.0.0' ? 'localhost' : config.host}:${server.port}`;
console.log(
  `\nSkinwright is running at ${url}  (database: ${server.databaseKind}${server.seeded ? ', demo seeded now' : ''})`,
);
if (config.seedDemo) {
  console.log('\nDemo sign-in accounts (invented scenario, local use only):');
  for (const a of server.accounts) console.log(`  ${a.email.padEnd(32)} ${a.password.padEnd(18)} ${a.role}`);
}
console.log(`\nAPI reference: ${url}/api/docs\n`);

let stopping = false;
for (const signal of ['SIGINT', 'SIGTERM'] as const)
  process.on(signal, () => {
    if (stopping) return;
    stopping = true;
    server
      .stop()
      .then(() => process.exit(0))
      .catch(() => process.exit(1));
  });
