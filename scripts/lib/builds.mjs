// 3. Builds: the server compiled by tsc (TypeORM reads decorator metadata), the web app exported by Expo.
// Node built-ins only.
import fs from 'node:fs';
import path from 'node:path';
import { env, fail, hashFiles, log, root, run } from './launcher.mjs';

export function buildServer() {
  if (run(path.join(root, 'node_modules', '.bin', 'tsc'), ['-p', 'server/tsconfig.json']) !== 0) {
    fail('The server does not compile: fix the TypeScript errors above.');
  }
}

export const webDir = path.resolve(root, env.BUNGWISE_WEB_EXPORT_DIR ?? path.join('dist', 'web'));

// `expo export`, then scripts/web/finish-export (compiled with the server): icons, manifest, route chunks,
// the service worker and the brotli/gzip twins. The hash covers the inputs of both halves.
export function exportWeb() {
  const hashFile = `${webDir}.source-hash`;
  const sourceHash = hashFiles(['app', 'components', 'shared', 'assets', 'scripts/web', 'index.ts', 'package.json', 'app.json', 'babel.config.js', 'package-lock.json', 'metro.config.js']);
  const current = fs.existsSync(hashFile) ? fs.readFileSync(hashFile, 'utf8') : '';
  if (current === sourceHash && fs.existsSync(path.join(webDir, 'index.html'))) return;
  log('Exporting the web app (first time or sources changed)...');
  if (run(path.join(root, 'node_modules', '.bin', 'expo'), ['export', '--platform', 'web', '--output-dir', path.relative(root, webDir)], { env: { ...env, CI: '1', EXPO_NO_TELEMETRY: '1' } }) !== 0) {
    fail('The web export failed: see the Expo output above.');
  }
  if (run('node', [path.join(root, 'dist', 'server', 'scripts', 'web', 'finish-export.js'), webDir]) !== 0) {
    fail('Finishing the web export (service worker, compression) failed: see the output above.');
  }
  fs.writeFileSync(hashFile, sourceHash);
}
