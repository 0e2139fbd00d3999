/**
 * Schedule print settings as project edits (pure; each returns a new project or throws naming
 * the entry): what the schedule lists (`schedule`, ScheduleSpec) and the revision block
 * (`report.revisions`, shared with the calculation report).
 */
import type { ProjectFile, ReportRevision, ScheduleListing } from '../../solver/index.ts';

export function setListing(project: ProjectFile, list: ScheduleListing): ProjectFile {
  const groups = project.schedule?.groups ?? [];
  if (list === 'groups' && groups.length === 0) {
    const first = project.groups?.[0]?.id;
    if (!first) throw new Error('schedule: the project has no groups to choose from');
    return { ...project, schedule: { list, groups: [first] } };
  }
  return { ...project, schedule: { ...project.schedule, list } };
}

/** Add or remove a group of the 'groups' listing (at least one stays). */
export function toggleListedGroup(project: ProjectFile, group: string, on: boolean): ProjectFile {
  const now = project.schedule?.groups ?? [];
  const groups = on ? (now.includes(group) ? now : [...now, group]) : now.filter((g) => g !== group);
  if (groups.length === 0) throw new Error('schedule: choose at least one group (or list the cables)');
  return { ...project, schedule: { ...project.schedule, list: 'groups', groups } };
}

const DATE = /^\d{4}-\d{2}-\d{2}$/;

function checked(r: ReportRevision, index: number): ReportRevision {
  const at = `report.revisions[${index}]`;
  if (!r.revision.trim()) throw new Error(`${at}: the revision mark is empty`);
  if (!DATE.test(r.date) || Number.isNaN(Date.parse(r.date))) throw new Error(`${at} "${r.revision}": date must be YYYY-MM-DD, got "${r.date}"`);
  if (!r.description.trim()) throw new Error(`${at} "${r.revision}": the description is empty`);
  const out: ReportRevision = { revision: r.revision.trim(), date: r.date, description: r.description.trim() };
  if (r.by?.trim()) out.by = r.by.trim();
  if (r.checkedBy?.trim()) out.checkedBy = r.checkedBy.trim();
  return out;
}

function withRevisions(project: ProjectFile, revisions: ReportRevision[]): ProjectFile {
  return { ...project, report: { ...project.report, revisions } };
}

/** The next revision mark after `last`: A → B, P01 → P02, 3 → 4; else `last` + "1". */
export function nextRevisionMark(last: string | undefined): string {
  if (!last) return 'A';
  const m = /^(.*?)(\d+)$/.exec(last);
  if (m) return `${m[1]}${String(Number(m[2]) + 1).padStart(m[2].length, '0')}`;
  if (/^[A-Y]$/i.test(last)) return String.fromCharCode(last.charCodeAt(0) + 1);
  return `${last}1`;
}

export function addRevision(project: ProjectFile, date: string): ProjectFile {
  const list = project.report?.revisions ?? [];
  const rev: ReportRevision = { revision: nextRevisionMark(list.at(-1)?.revision), date, description: 'Issued for review' };
  return withRevisions(project, [...list, checked(rev, list.length)]);
}

export function updateRevision(project: ProjectFile, index: number, patch: Partial<ReportRevision>): ProjectFile {
  const list = project.report?.revisions ?? [];
  if (!list[index]) throw new Error(`report.revisions[${index}] does not exist`);
  return withRevisions(project, list.map((r, i) => (i === index ? checked({ ...r, ...patch }, i) : r)));
}

export function removeRevision(project: ProjectFile, index: number): ProjectFile {
  const list = project.report?.revisions ?? [];
  if (!list[index]) throw new Error(`report.revisions[${index}] does not exist`);
  return withRevisions(project, list.filter((_, i) => i !== index));
}
