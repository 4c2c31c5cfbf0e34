// Entry of the import worker threads. The server runs its TypeScript through tsx
// (`node --import tsx`, which a worker inherits) and Jest through ts-jest in the test process
// only, which a worker does not inherit; registering tsx's CommonJS loader here makes the worker
// load the TypeScript module (and the project's `@/` paths from tsconfig.json) either way.
require('tsx/cjs/api').register();
module.exports = require('./import-worker.ts').importTask;
