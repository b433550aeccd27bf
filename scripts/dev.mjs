// Development: the API under `tsx watch` (restarts on change) and the Angular dev server (rebuilds
// on change, proxies /api to the API). Ctrl+C stops both.
import { spawn } from 'node:child_process';

const children = [
  spawn('npx', ['tsx', 'watch', '--clear-screen=false', 'server/main.ts'], { stdio: 'inherit', env: { ...process.env, NODE_ENV: 'development' } }),
  spawn('npx', ['ng', 'serve'], { stdio: 'inherit', env: { ...process.env, NG_CLI_ANALYTICS: 'false' } }),
];

function stop() {
  for (const child of children) child.kill('SIGTERM');
}
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
for (const child of children) child.on('exit', (code) => { if (code) process.exitCode = code; stop(); });
