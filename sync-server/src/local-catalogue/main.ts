import { startLocalCatalogue } from './sru-server';

/**
 * `npm start` runs this beside the server: the local catalogue on 127.0.0.1, port
 * LAMPLIGHT_LOCAL_CATALOGUE_PORT (41500 by default, the default of LAMPLIGHT_CATALOGUE_URLS).
 */
const port = Number(process.env['LAMPLIGHT_LOCAL_CATALOGUE_PORT'] ?? 41500);

startLocalCatalogue(port)
  .then((catalogue) => {
    console.log(`Local catalogue (SRU 2.0, invented records) at ${catalogue.url}`);
    const stop = () => void catalogue.close().then(() => process.exit(0));
    process.on('SIGINT', stop);
    process.on('SIGTERM', stop);
  })
  .catch((error: unknown) => {
    console.error(`The local catalogue could not listen on 127.0.0.1:${port}: ${error instanceof Error ? error.message : error}`);
    process.exit(1);
  });
