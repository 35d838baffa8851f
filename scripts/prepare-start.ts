import { ensureWebBuild } from './build-web';
import { buildServer } from './build-server';

// The first half of `npm start`: build the web app when it is missing or stale, and compile the server. The second
// half runs the compiled server in a process of its own, so the web build's tools (Workbox, Metro's client) never
// sit in the server's memory.
ensureWebBuild()
  .then(buildServer)
  .catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
