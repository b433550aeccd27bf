#!/usr/bin/env node
// The `borewright` command: works on job documents without a server. It runs the compiled bundle of
// server/cli (scripts/server-bundle.mjs), built on the first run and again whenever a source has changed
// since, so that a command costs no compiling.
import { freshBundle } from '../scripts/server-bundle.mjs';

const { main } = await import(await freshBundle('cli'));
process.exitCode = await main(process.argv.slice(2));
