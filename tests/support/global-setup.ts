// vitest global set-up: makes sure the test MariaDB instance (its own port and data
// directory) is running, and stops it afterwards if this run started it. `npm test`
// starts it beforehand, so under CI this only checks it answers.
import { instance, start, stop } from '../../scripts/lib/mariadb';

export default async function setup() {
  const db = instance('test');
  let started = false;
  try {
    started = await start(db, () => {});
  } catch (e) {
    // Pure unit tests can still run without MariaDB; integration tests will fail clearly.
    console.warn(`[tests] test database not available: ${(e as Error).message}`);
  }
  process.env.MARGIN_TEST_DB_PORT = String(db.port);
  return async () => {
    if (started) await stop(db, () => {});
  };
}
