import { spawn, type ChildProcess } from 'node:child_process';

// `npm run dev`: the API in watch mode on RINGSEAT_API_PORT (3001) and Vite's dev server proxying /api to it.
const apiPort = process.env.RINGSEAT_API_PORT ?? '3001';
const children: ChildProcess[] = [
  spawn('npx', ['tsx', 'watch', '--clear-screen=false', 'server/index.ts'], {
    stdio: 'inherit',
    env: { ...process.env, PORT: apiPort },
  }),
  spawn('npx', ['vite'], { stdio: 'inherit', env: { ...process.env, RINGSEAT_API_PORT: apiPort } }),
];

const stop = () => {
  for (const child of children) child.kill('SIGTERM');
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
for (const child of children) child.on('exit', (code) => code && code !== 0 && stop());
