import { main } from '../server/index';
import { ensureWebBuild } from './build-web';

// `npm start`: build the web app when it is missing or stale, then migrate, seed and serve.
ensureWebBuild()
  .then(main)
  .catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
