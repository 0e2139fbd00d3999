/**
 * The desktop host's site methods through the IPC dispatch: runSite hands the validated request to
 * the site runner; printSiteDocument builds the document, asks for a PDF path named after it and
 * prints that HTML; a cancelled dialog prints nothing; the hidden print window may not use them.
 */
import { describe, expect, it } from 'vitest';
import type { HostResult } from '../../../main/common/host-contract.ts';
import type { SiteOutcome, SiteRequest } from '../../../main/common/site/site-run.ts';
import { appPageUrl } from '../../../main/electron/app-url.ts';
import { createDesktopHandlers } from '../../../main/electron/desktop-host.ts';
import { GrantedPaths } from '../../../main/electron/granted-paths.ts';
import { dispatchIpcCall } from '../../../main/electron/ipc-dispatch.ts';
import { PrintJobs } from '../../../main/electron/print-jobs.ts';
import { QuitGuard } from '../../../main/electron/quit-guard.ts';
import { ProjectService } from '../../../main/store/project-service.ts';
import { sampleMast } from '../store/sample-project.ts';

function rig(pdfAnswer: string | null) {
  const requests: SiteRequest[] = [];
  const printed: { html: string; path: string }[] = [];
  const suggested: string[] = [];
  const handlers = createDesktopHandlers({
    projects: new ProjectService({ userDataDir: '/nonexistent-user-data' }),
    analysis: { start: () => ({ runId: '0123456789abcdef' }), cancel: () => undefined, caseFields: () => null },
    dialogs: { chooseProjectToOpen: async () => null, chooseProjectSavePath: async () => null, choosePdfPath: async (name) => { suggested.push(name); return pdfAnswer; } },
    granted: new GrantedPaths(), quit: new QuitGuard(), assetsDir: null, initialPath: () => null,
    printPdf: async (_p, pdf) => ({ ok: true, value: { path: pdf } }),
    onDirtyChanged: () => undefined,
    site: {
      run: async (_p, r): Promise<HostResult<SiteOutcome>> => {
        requests.push(r);
        return { ok: true, value: { kind: 'document', html: '<p>crew</p>', title: 'Mast crew sheet s1' } };
      },
      cancel: () => undefined,
    },
    printHtml: async (html, path) => { printed.push({ html, path }); return { ok: true, value: { path } }; },
  });
  const ctx = { allowedSenders: new Set([1, 2]), printJobs: new PrintJobs() };
  const call = (sender: number, method: Parameters<typeof dispatchIpcCall>[2], ...args: unknown[]) =>
    dispatchIpcCall(handlers, ctx, method, { senderId: sender, isMainFrame: true, frameUrl: appPageUrl() }, args);
  return { requests, printed, suggested, ctx, call };
}

const crew: SiteRequest = { kind: 'crewSheet', id: 's1', units: 'SI', paper: 'a4', issueDate: '2026-12-02' };

describe('desktop site methods', () => {
  it('prints the built document to the chosen PDF', async () => {
    const r = rig('/tmp/out.pdf');
    expect(await r.call(1, 'printSiteDocument', sampleMast(), crew)).toEqual({ ok: true, value: { ok: true, value: { path: '/tmp/out.pdf' } } });
    expect(r.requests).toEqual([crew]);
    expect(r.suggested).toEqual(['Mast crew sheet s1.pdf']);
    expect(r.printed).toEqual([{ html: '<p>crew</p>', path: '/tmp/out.pdf' }]);
  });

  it('prints nothing when the dialog is cancelled, and refuses a bad request before any work', async () => {
    const r = rig(null);
    expect(await r.call(1, 'printSiteDocument', sampleMast(), crew)).toEqual({ ok: true, value: null });
    expect(r.printed).toEqual([]);
    const bad = await r.call(1, 'runSite', sampleMast(), { kind: 'crewSheet', id: 's1' });
    expect(bad).toMatchObject({ ok: false, error: expect.stringContaining('runSite: argument 2 (request) units must be "SI" or "US"') });
    expect(r.requests).toHaveLength(1);
  });

  it('is not available in the hidden print window', async () => {
    const r = rig('/tmp/out.pdf');
    const done = r.ctx.printJobs.add(2, sampleMast(), 10_000);
    done.catch(() => undefined);
    expect(await r.call(2, 'runSite', sampleMast(), { kind: 'sequence', id: 's1' })).toEqual({ ok: false, error: 'runSite is not available in the print window' });
    r.ctx.printJobs.remove(2);
    expect(r.requests).toEqual([]);
  });
});
