import { ensureClientBuilt } from './client-build.js';

// `npm start`: build the client if needed, then serve API and client from one process.
ensureClientBuilt();
await import('../server/index.js');
