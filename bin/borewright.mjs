#!/usr/bin/env node
// The `borewright` command: works on job documents without a server. The TypeScript sources run
// through tsx, so nothing needs building after `npm install`.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../server/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
