/**
 * Per-user folders shared by the desktop and web hosts. The defaults match Electron's
 * `app.getPath('userData')` for productName "Stayset", so both editions see the same recent
 * list and recovery files.
 *   Windows: %APPDATA%\Stayset   macOS: ~/Library/Application Support/Stayset
 *   Linux:   $XDG_CONFIG_HOME/Stayset (default ~/.config/Stayset)
 */
import os from 'node:os';
import path from 'node:path';

export function defaultUserDataDir(platform: NodeJS.Platform = process.platform, env: NodeJS.ProcessEnv = process.env, home = os.homedir()): string {
  if (platform === 'win32') return path.join(env.APPDATA ?? path.join(home, 'AppData', 'Roaming'), 'Stayset');
  if (platform === 'darwin') return path.join(home, 'Library', 'Application Support', 'Stayset');
  return path.join(env.XDG_CONFIG_HOME ?? path.join(home, '.config'), 'Stayset');
}

export function recoveryDirIn(userDataDir: string): string {
  return path.join(userDataDir, 'recovery');
}
