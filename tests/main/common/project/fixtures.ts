/** Test helpers: the invented project files under tests/fixtures/projects/. */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export const FIXTURE_DIR = fileURLToPath(new URL('../../../fixtures/projects/', import.meta.url));

export function fixtureText(name: string): string {
  return readFileSync(`${FIXTURE_DIR}${name}`, 'utf8');
}

export function fixtureJson(name: string): Record<string, unknown> {
  return JSON.parse(fixtureText(name)) as Record<string, unknown>;
}

/** The reference example of format v1: the schema must accept it exactly as written. */
export const SPEC_SUBSET = `{ "format": "stayset-project", "version": 2,
  "nodes":    [{ "id": "A", "at": [0, 0, 0], "fixed": "xyz" }, { "id": "B", "at": [40, 0, 30] }],
  "sections": [{ "id": "strand", "E": 160e9, "area": 1.5e-4, "massPerLength": 1.2,
                 "breakingLoad": 180e3, "thermalExpansion": 1.2e-5, "diameter": 0.016 }],
  "members":  [{ "id": "G1", "kind": "cable", "from": "A", "to": "B", "section": "strand",
                 "segments": 20, "unstressedLength": 49.985 }],
  "loadCases":[{ "id": "dead", "selfWeight": true, "temperatureChange": 0,
                 "nodalLoads": [{ "node": "B", "force": [1000, 0, 0] }] }] }`;
