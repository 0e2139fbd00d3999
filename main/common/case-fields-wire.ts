/**
 * Binary form of one case's raw fields (CaseFields) for the web host: the browser edition fetches
 * it as application/octet-stream instead of JSON (a large net's positions are megabytes of
 * numbers). Little-endian layout, 8-byte aligned:
 *   u32 magic 'SSF1', u32 version 1, u32 positions length P, u32 element count M,
 *   f64[P] positions (m), f64[M] element tension (N), u8[M] element slack (0/1).
 * Electron's IPC carries CaseFields as typed arrays directly (structured clone).
 */
import type { CaseFields } from '../../solver/index.ts';

const MAGIC = 0x31465353; // 'SSF1'
const HEADER_BYTES = 16;

export const CASE_FIELDS_MIME = 'application/vnd.stayset.case-fields';

export function encodeCaseFields(f: CaseFields): ArrayBuffer {
  const P = f.positions.length, M = f.elementTension.length;
  const buffer = new ArrayBuffer(HEADER_BYTES + 8 * (P + M) + M);
  const view = new DataView(buffer);
  view.setUint32(0, MAGIC, true);
  view.setUint32(4, 1, true);
  view.setUint32(8, P, true);
  view.setUint32(12, M, true);
  new Float64Array(buffer, HEADER_BYTES, P).set(f.positions);
  new Float64Array(buffer, HEADER_BYTES + 8 * P, M).set(f.elementTension);
  new Uint8Array(buffer, HEADER_BYTES + 8 * (P + M), M).set(f.elementSlack);
  return buffer;
}

export function decodeCaseFields(buffer: ArrayBuffer): CaseFields {
  if (buffer.byteLength < HEADER_BYTES) throw new Error('case fields: reply is shorter than its header');
  const view = new DataView(buffer);
  if (view.getUint32(0, true) !== MAGIC || view.getUint32(4, true) !== 1) throw new Error('case fields: unknown binary format');
  const P = view.getUint32(8, true), M = view.getUint32(12, true);
  if (buffer.byteLength !== HEADER_BYTES + 8 * (P + M) + M) throw new Error('case fields: reply length does not match its header');
  return {
    positions: new Float64Array(buffer.slice(HEADER_BYTES, HEADER_BYTES + 8 * P)),
    elementTension: new Float64Array(buffer.slice(HEADER_BYTES + 8 * P, HEADER_BYTES + 8 * (P + M))),
    elementSlack: new Uint8Array(buffer.slice(HEADER_BYTES + 8 * (P + M))),
  };
}
