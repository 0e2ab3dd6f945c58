// npm run db -- start|stop|status [dev|test]
import { instance, ping, start, stop, urlFor } from './lib/mariadb';

const [command = 'status', name = 'dev'] = process.argv.slice(2);
const i = instance(name);
try {
  if (command === 'start') await start(i);
  else if (command === 'stop') await stop(i);
  else if (command === 'status') console.log(ping(i) ? `MariaDB (${i.name}) running: ${urlFor(i)}` : `MariaDB (${i.name}) not running`);
  else throw new Error(`unknown command "${command}" (use start, stop or status)`);
} catch (e) {
  console.error(`db: ${(e as Error).message}`);
  process.exit(1);
}
