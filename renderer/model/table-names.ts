/** The editable model tables and the project-file array each one edits. */
import type { LoadCaseSpec, MemberSpec, NodeSpec, ProjectFile, SectionSpec } from '../../solver/index.ts';

export type TableName = 'nodes' | 'members' | 'sections' | 'loadCases';

export interface TableRow {
  nodes: NodeSpec;
  members: MemberSpec;
  sections: SectionSpec;
  loadCases: LoadCaseSpec;
}

export const TABLE_TITLES: Record<TableName, string> = {
  nodes: 'Nodes',
  members: 'Members',
  sections: 'Sections',
  loadCases: 'Load cases',
};

/** Singular noun used in messages: `Member "G1"`. */
export const ROW_NOUN: Record<TableName, string> = {
  nodes: 'Node',
  members: 'Member',
  sections: 'Section',
  loadCases: 'Load case',
};

export function rowsOf<K extends TableName>(project: ProjectFile, table: K): TableRow[K][] {
  return project[table] as TableRow[K][];
}
