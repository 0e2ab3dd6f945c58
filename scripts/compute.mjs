#!/usr/bin/env node
// `npm run -s compute -- FILE`: runs the engine's command line from its prebuilt bundle
// (dist/engine/cli.mjs), rebuilding it first when lib/resampling or lib/compute changed.
// Plain JS on purpose: starting TypeScript through tsx would cost ~0.3 s per call.
import { ensureBuilt } from '../lib/compute/build-engine.mjs';

const paths = await ensureBuilt();
process.env.MARGIN_ENGINE_WORKER = paths.worker;
await import(new URL(`file://${paths.cli}`).href);
