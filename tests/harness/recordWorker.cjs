/* eslint-disable @typescript-eslint/no-require-imports -- a CommonJS bootstrap: tsx's require hook must load before the .ts entry */
// The record worker (main/recordWorker.ts) run from source: tsx's require hook, then the entry.
// The built app uses dist/main/recordWorker.cjs instead.
require('tsx/cjs');
require('../../main/recordWorker.ts');
