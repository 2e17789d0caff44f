// `npm start` builds the client once, when dist/ has no build yet.
import { existsSync } from 'node:fs';
import { execSync } from 'node:child_process';

if (!existsSync('dist/index.html')) {
  console.log('Building the client (first start only)…');
  execSync('npx vite build', { stdio: 'inherit' });
}
