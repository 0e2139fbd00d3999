/**
 * The project file the app was started with: the first argument ending in `.stayset` after the
 * executable (and, unpackaged, after the app folder). Electron/Chromium switches are skipped.
 */
export function projectFileFromArgv(argv: string[], isPackaged: boolean): string | null {
  const rest = argv.slice(isPackaged ? 1 : 2);
  return rest.find((a) => !a.startsWith('-') && a.toLowerCase().endsWith('.stayset')) ?? null;
}
