/**
 * Command line of the web host (`node --import tsx main/web/start.ts`):
 *   --root DIR        project folder for open/save (default: current folder)
 *   --port N          port on 127.0.0.1 (default 0 = any free port)
 *   --open FILE       project opened at start (relative to --root)
 *   --open-demo [N]   open the bundled demo N (default demo-mast.stayset)
 *   --data DIR        folder for recent list and recovery (default: the desktop's user data)
 *   --static DIR      built renderer (default dist/renderer)
 */
export interface WebCliOptions {
  root: string;
  port: number;
  open: string | null;
  openDemo: string | null;
  dataDir: string | null;
  staticDir: string | null;
}

export const DEFAULT_DEMO = 'demo-mast.stayset';

export type CliParse = { ok: true; options: WebCliOptions } | { ok: false; error: string };

export function parseWebCli(argv: string[], cwd: string): CliParse {
  const o: WebCliOptions = { root: cwd, port: 0, open: null, openDemo: null, dataDir: null, staticDir: null };
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    const value = (): string => {
      const v = argv[i + 1];
      if (v === undefined || v.startsWith('--')) throw new Error(`${arg} needs a value`);
      i++;
      return v;
    };
    try {
      switch (arg) {
        case '--root': o.root = value(); break;
        case '--open': o.open = value(); break;
        case '--data': o.dataDir = value(); break;
        case '--static': o.staticDir = value(); break;
        case '--port': {
          const v = value();
          const n = Number(v);
          if (!/^\d+$/.test(v) || n > 65535) return { ok: false, error: `--port: "${v}" is not a port number (0–65535)` };
          o.port = n;
          break;
        }
        case '--open-demo': {
          const next = argv[i + 1];
          o.openDemo = next !== undefined && !next.startsWith('--') ? (i++, next) : DEFAULT_DEMO;
          break;
        }
        default:
          return { ok: false, error: `Unknown option "${arg}" (options: --root, --port, --open, --open-demo, --data, --static)` };
      }
    } catch (e) {
      return { ok: false, error: (e as Error).message };
    }
  }
  if (o.open && o.openDemo) return { ok: false, error: 'Give either --open or --open-demo, not both' };
  return { ok: true, options: o };
}
