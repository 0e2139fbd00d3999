import { describe, expect, it } from 'vitest';
import { solveProject } from '../../../solver/index.ts';
import type { ProjectFile } from '../../../solver/index.ts';

/**
 * A weightless cable under no load has no stiffness across its line: its interior nodes can move
 * freely (to first order), so the solve must stop and name them, not report convergence after
 * 0 iterations. A weightless cable that is slack over its whole length carries nothing: that is
 * the answer (reported converged and slack). With pretension or weight the same cable is determined.
 */
function weightless(member: Partial<ProjectFile['members'][number]>, massPerLength = 0): ProjectFile {
  return {
    format: 'stayset-project', version: 1,
    nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'B', at: [40, 0, 30], fixed: 'xyz' }],
    sections: [{ id: 's', E: 160e9, area: 1.5e-4, massPerLength, thermalExpansion: 1.2e-5 }],
    members: [{ id: 'G1', kind: 'cable', from: 'A', to: 'B', section: 's', segments: 4, ...member }],
    loadCases: [{ id: 'none' }],
  };
}

describe('a cable without tension holds nothing across its line', () => {
  it.each([{ pretension: 0 }, { unstressedLength: 50 }, { unstressedLength: 60 }])('%o: a mechanism naming the member', (member) => {
    const c = solveProject(weightless(member)).report.cases[0];
    expect(c.converged).toBe(false);
    expect(c.status).toBe('singular');
    expect(c.message).toMatch(/interior node \d of member "G1" direction [xyz]/);
    expect(c.message).toMatch(/cables without tension/);
  });

  it('with pretension, or with weight, it converges', () => {
    expect(solveProject(weightless({ pretension: 100 })).report.cases[0].status).toBe('converged');
    expect(solveProject(weightless({ pretension: 0 }, 1.2)).report.cases[0].status).toBe('converged');
  });

  it('slack over its whole length (heated past its pretension) it carries nothing, converged', () => {
    const p = weightless({ pretension: 1e3 });
    p.loadCases = [{ id: 'hot', temperatureChange: 100 }];
    const c = solveProject(p).report.cases[0];
    expect(c.status).toBe('converged');
    expect(c.slackMembers).toEqual(['G1']);
  });
});
