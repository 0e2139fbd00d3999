/**
 * Start the loopback web host: `node --import tsx main/web/start.ts [options]` (see cli-args.ts).
 * Prints the start URL (with the per-run token) on stdout; Ctrl+C stops it.
 */
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { defaultUserDataDir } from '../store/user-dirs.ts';
import { parseWebCli } from './cli-args.ts';
import { startWebHost } from './web-server.ts';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

async function main(): Promise<void> {
  const parsed = parseWebCli(process.argv.slice(2), process.cwd());
  if (!parsed.ok) {
    console.error(`stayset web: ${parsed.error}`);
    process.exit(2);
  }
  const o = parsed.options;
  const assetsDir = path.join(repoRoot, 'assets');
  const host = await startWebHost({
    root: path.resolve(o.root),
    staticDir: o.staticDir ? path.resolve(o.staticDir) : path.join(repoRoot, 'dist', 'renderer'),
    assetsDir,
    userDataDir: o.dataDir ? path.resolve(o.dataDir) : defaultUserDataDir(),
    port: o.port,
    initialPath: o.openDemo ? path.join(assetsDir, o.openDemo) : o.open,
  });
  console.log(`Stayset web host for ${path.resolve(o.root)}`);
  console.log('Results are for review by a qualified engineer; local codes and licensed practice govern.');
  console.log(host.url);
  const stop = (): void => void host.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((e: unknown) => {
  console.error(`stayset web: ${e instanceof Error ? e.message : String(e)}`);
  process.exit(1);
});
