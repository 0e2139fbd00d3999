/**
 * Semantic checks of the design actions (solver/project/actions-types.ts): panels, area loads,
 * patch wind, member loss, wind directions, ancillaries, ice with wind and unbalanced ice. Messages name the entry: `panels[2] "P3": node "N9" does not exist`.
 * Runs on partly invalid documents; values of the wrong type are left to the schema. A check
 * whose list is absent or empty returns at once (no id tables of a large net's members built).
 */
import { entryLabel } from './error-path.ts';
import { entries, idSet, isRec, num, str, strings } from './doc-access.ts';
import type { Rec } from './doc-access.ts';

/** Panels smaller than this (m²) are degenerate. Common practice: far below any real panel. */
export const MIN_PANEL_AREA = 1e-9;

function nodePositions(root: unknown): Map<string, number[]> {
  const at = new Map<string, number[]>();
  for (const { entry } of entries(root, 'nodes')) {
    const id = str(entry, 'id');
    const p = entry.at;
    if (id !== undefined && Array.isArray(p) && p.length === 3 && p.every((c) => typeof c === 'number' && Number.isFinite(c))) at.set(id, p as number[]);
  }
  return at;
}

function duplicateIds(root: unknown, list: string, errors: string[]): void {
  const first = new Map<string, number>();
  for (const { index, entry } of entries(root, list)) {
    const id = str(entry, 'id');
    if (id === undefined) continue;
    const f = first.get(id);
    if (f === undefined) first.set(id, index);
    else errors.push(`${entryLabel(root, list, index)}: id ${JSON.stringify(id)} is already used by ${list}[${f}]`);
  }
}

function panelErrors(root: unknown, errors: string[]): void {
  if (entries(root, 'panels').length === 0) return; // no node tables to build for a file without panels
  const at = nodePositions(root);
  const nodes = idSet(root, 'nodes');
  for (const { index, entry } of entries(root, 'panels')) {
    const label = entryLabel(root, 'panels', index);
    const corners = strings(entry, 'nodes');
    const seen = new Set<string>();
    for (const c of corners) {
      if (!nodes.has(c.value)) errors.push(`${label}: node ${JSON.stringify(c.value)} does not exist`);
      if (seen.has(c.value)) errors.push(`${label}: node ${JSON.stringify(c.value)} appears twice in the loop`);
      seen.add(c.value);
    }
    const pts = corners.map((c) => at.get(c.value));
    if (pts.length >= 3 && pts.every((p) => p !== undefined)) {
      // vector area ½ Σ x_k × x_{k+1}
      const a = [0, 0, 0];
      pts.forEach((p, k) => {
        const q = pts[(k + 1) % pts.length]!;
        a[0] += 0.5 * (p![1] * q[2] - p![2] * q[1]);
        a[1] += 0.5 * (p![2] * q[0] - p![0] * q[2]);
        a[2] += 0.5 * (p![0] * q[1] - p![1] * q[0]);
      });
      if (Math.hypot(a[0], a[1], a[2]) < MIN_PANEL_AREA) errors.push(`${label}: the loop encloses no area (its corners are in one line or at one place)`);
    }
  }
}

function areaLoadErrors(root: unknown, errors: string[]): void {
  const panelIds = idSet(root, 'panels');
  const targets = new Set(panelIds);
  for (const { entry } of entries(root, 'panels')) { const r = str(entry, 'region'); if (r !== undefined) targets.add(r); }
  for (const { index, entry } of entries(root, 'loadCases')) {
    const label = entryLabel(root, 'loadCases', index);
    for (const { index: j, entry: load } of entries(entry, 'areaLoads')) {
      const at = `${label}: areaLoads[${j}]`;
      const kind = str(load, 'kind');
      const value = num(load, 'value');
      if (panelIds.size === 0) errors.push(`${at}: the project has no panels to carry it (add "panels")`);
      if ((kind === 'snow' || kind === 'cladding') && value !== undefined && value < 0) errors.push(`${at}: ${kind} load must not be negative (got ${value} Pa; it acts downward)`);
      for (const p of strings(load, 'panels')) if (panelIds.size > 0 && !targets.has(p.value)) errors.push(`${at}: panels: ${JSON.stringify(p.value)} is neither a panel nor a region`);
      const coefficients = entries(load, 'coefficients');
      if (coefficients.length > 0 && kind !== undefined && kind !== 'pressure') errors.push(`${at}: coefficients apply to "pressure" loads only (this is "${kind}")`);
      for (const c of coefficients) {
        const r = str(c.entry, 'region');
        if (r !== undefined && panelIds.size > 0 && !targets.has(r)) errors.push(`${at}: coefficients[${c.index}]: ${JSON.stringify(r)} is neither a panel nor a region`);
      }
    }
  }
}

function caseById(root: unknown): Map<string, Rec> {
  const m = new Map<string, Rec>();
  for (const { entry } of entries(root, 'loadCases')) { const id = str(entry, 'id'); if (id !== undefined) m.set(id, entry); }
  return m;
}

function patchWindErrors(root: unknown, errors: string[]): void {
  if (entries(root, 'patchWind').length === 0) return;
  const cases = caseById(root);
  const taken = new Set([...cases.keys(), ...idSet(root, 'combinations')]);
  for (const { index, entry } of entries(root, 'patchWind')) {
    const label = entryLabel(root, 'patchWind', index);
    const id = str(entry, 'id');
    if (id !== undefined && taken.has(id)) errors.push(`${label}: id ${JSON.stringify(id)} is already used by a load case or combination`);
    const mean = str(entry, 'meanCase');
    const spec = mean === undefined ? undefined : cases.get(mean);
    if (mean !== undefined && !spec) errors.push(`${label}: meanCase: load case ${JSON.stringify(mean)} does not exist`);
    else if (spec && !isRec(spec.wind)) errors.push(`${label}: meanCase: load case ${JSON.stringify(mean)} has no wind`);
    for (const p of entries(entry, 'patches')) {
      const from = num(p.entry, 'from'), to = num(p.entry, 'to');
      if (from !== undefined && to !== undefined && !(to > from)) errors.push(`${label}: patches[${p.index}]: "to" (${to} m) must be above "from" (${from} m)`);
    }
  }
}

function memberLossErrors(root: unknown, errors: string[]): void {
  if (entries(root, 'memberLoss').length === 0) return; // no id tables of the members to build
  const cases = new Set([...idSet(root, 'loadCases'), ...idSet(root, 'combinations')]);
  const members = idSet(root, 'members');
  const groups = idSet(root, 'groups');
  for (const { entry } of entries(root, 'members')) for (const g of strings(entry, 'groups')) groups.add(g.value);
  for (const { index, entry } of entries(root, 'memberLoss')) {
    const label = entryLabel(root, 'memberLoss', index);
    const id = str(entry, 'id');
    if (id !== undefined && cases.has(id)) errors.push(`${label}: id ${JSON.stringify(id)} is already used by a load case or combination`);
    const from = str(entry, 'fromCase');
    if (from !== undefined && !cases.has(from)) errors.push(`${label}: fromCase: case ${JSON.stringify(from)} does not exist (no load case or combination has this id)`);
    const listed = strings(entry, 'members');
    for (const m of listed) if (!members.has(m.value)) errors.push(`${label}: members: member ${JSON.stringify(m.value)} does not exist`);
    const group = str(entry, 'group');
    if (group !== undefined && !groups.has(group)) errors.push(`${label}: group ${JSON.stringify(group)} does not exist`);
    if (listed.length === 0 && group === undefined) errors.push(`${label}: name the members to remove ("members" or "group")`);
    if (entry.dynamicFactor !== undefined && entry.dampingRatio !== undefined) errors.push(`${label}: give either "dynamicFactor" or "dampingRatio", not both`);
  }
}

function windDirectionErrors(root: unknown, errors: string[]): void {
  if (entries(root, 'windDirections').length === 0) return;
  const cases = caseById(root);
  const taken = new Set([...cases.keys(), ...idSet(root, 'combinations')]);
  for (const { index, entry } of entries(root, 'windDirections')) {
    const label = entryLabel(root, 'windDirections', index);
    const id = str(entry, 'id');
    if (id !== undefined && taken.has(id)) errors.push(`${label}: id ${JSON.stringify(id)} is already used by a load case or combination`);
    const c = str(entry, 'case');
    const spec = c === undefined ? undefined : cases.get(c);
    if (c !== undefined && !spec) errors.push(`${label}: case: load case ${JSON.stringify(c)} does not exist`);
    else if (spec && !isRec(spec.wind)) errors.push(`${label}: case: load case ${JSON.stringify(c)} has no wind`);
  }
}

function ancillaryErrors(root: unknown, errors: string[]): void {
  if (entries(root, 'ancillaries').length === 0) return;
  const nodes = idSet(root, 'nodes');
  const groups = idSet(root, 'groups');
  for (const { entry } of entries(root, 'members')) for (const g of strings(entry, 'groups')) groups.add(g.value);
  for (const { index, entry } of entries(root, 'ancillaries')) {
    const label = entryLabel(root, 'ancillaries', index);
    const node = str(entry, 'node');
    const along = isRec(entry.along) ? entry.along : undefined;
    if ((node === undefined) === (along === undefined)) errors.push(`${label}: give either "node" (a point item) or "along" (a line item)`);
    if (node !== undefined && !nodes.has(node)) errors.push(`${label}: node ${JSON.stringify(node)} does not exist`);
    if (along) {
      const g = str(along, 'group');
      if (g !== undefined && !groups.has(g)) errors.push(`${label}: along: group ${JSON.stringify(g)} does not exist`);
      const from = num(along, 'from'), to = num(along, 'to');
      if (from !== undefined && to !== undefined && !(to > from)) errors.push(`${label}: along: "to" (${to} m) must be above "from" (${from} m)`);
    }
    const behaviour = str(entry, 'iceBehaviour') ?? 'perThickness';
    if (behaviour === 'coat') {
      if (entry.coatWidth === undefined) errors.push(`${label}: iceBehaviour "coat" needs coatWidth (outer width of the iced body, m)`);
      if (node !== undefined && entry.coatLength === undefined) errors.push(`${label}: iceBehaviour "coat" on a point item needs coatLength (length of the iced body, m)`);
      if (along && entry.coatLength !== undefined) errors.push(`${label}: coatLength applies to point items only (a line item ices per metre of height)`);
    }
    if (behaviour !== 'coat' && (entry.coatWidth !== undefined || entry.coatLength !== undefined)) errors.push(`${label}: coatWidth and coatLength need iceBehaviour "coat"`);
    if (behaviour !== 'perThickness' && (entry.iceDragArea !== undefined || entry.iceMass !== undefined)) errors.push(`${label}: iceDragArea and iceMass apply to iceBehaviour "perThickness" only`);
  }
}

function iceActionErrors(root: unknown, errors: string[]): void {
  if (entries(root, 'iceWithWind').length === 0 && entries(root, 'unbalancedIce').length === 0) return;
  const cases = caseById(root);
  const taken = new Set([...cases.keys(), ...idSet(root, 'combinations')]);
  const groups = idSet(root, 'groups');
  for (const { entry } of entries(root, 'members')) for (const g of strings(entry, 'groups')) groups.add(g.value);
  const needCase = (label: string, field: string, id: string | undefined, what: 'ice' | 'wind') => {
    const spec = id === undefined ? undefined : cases.get(id);
    if (id !== undefined && !spec) errors.push(`${label}: ${field}: load case ${JSON.stringify(id)} does not exist`);
    else if (spec && !isRec(spec[what])) errors.push(`${label}: ${field}: load case ${JSON.stringify(id)} has no ${what}`);
  };
  for (const { index, entry } of entries(root, 'iceWithWind')) {
    const label = entryLabel(root, 'iceWithWind', index);
    const id = str(entry, 'id');
    if (id !== undefined && taken.has(id)) errors.push(`${label}: id ${JSON.stringify(id)} is already used by a load case or combination`);
    needCase(label, 'iceCase', str(entry, 'iceCase'), 'ice');
    needCase(label, 'windCase', str(entry, 'windCase'), 'wind');
    const seen = new Set<string>();
    for (const p of entries(entry, 'pairs')) {
      const key = `${num(p.entry, 'ice')} ${num(p.entry, 'wind')}`;
      if (seen.has(key)) errors.push(`${label}: pairs[${p.index}]: the same pair is listed twice`);
      seen.add(key);
    }
  }
  for (const { index, entry } of entries(root, 'unbalancedIce')) {
    const label = entryLabel(root, 'unbalancedIce', index);
    const id = str(entry, 'id');
    if (id !== undefined && taken.has(id)) errors.push(`${label}: id ${JSON.stringify(id)} is already used by a load case or combination`);
    needCase(label, 'case', str(entry, 'case'), 'ice');
    const g = str(entry, 'group');
    if (g !== undefined && !groups.has(g)) errors.push(`${label}: group ${JSON.stringify(g)} does not exist`);
  }
}

export function actionErrors(root: unknown): string[] {
  const errors: string[] = [];
  for (const list of ['panels', 'patchWind', 'memberLoss', 'windDirections', 'ancillaries', 'iceWithWind', 'unbalancedIce']) duplicateIds(root, list, errors);
  iceActionErrors(root, errors);
  ancillaryErrors(root, errors);
  windDirectionErrors(root, errors);
  panelErrors(root, errors);
  areaLoadErrors(root, errors);
  patchWindErrors(root, errors);
  memberLossErrors(root, errors);
  return errors;
}
