/**
 * The window title: "<project> • — Stayset" while there are unsaved changes, "<project> — Stayset"
 * otherwise. The renderer may send its title with its own dirty mark; a trailing " •" or " *" is
 * dropped first so the mark never doubles.
 */
export function plainProjectTitle(title: string): string {
  return title.replace(/(\s*[•*])+\s*$/u, '').trim();
}

export function windowTitle(title: string, dirty: boolean): string {
  return `${plainProjectTitle(title) || 'Untitled'}${dirty ? ' •' : ''} — Stayset`;
}
