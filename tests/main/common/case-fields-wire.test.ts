import { describe, expect, it } from 'vitest';
import { decodeCaseFields, encodeCaseFields } from '../../../main/common/case-fields-wire.ts';

describe('binary case fields', () => {
  it('round-trips every number bit for bit', () => {
    const fields = {
      positions: Float64Array.from([0, -0, 1e-300, 12.5, -3.25, Number.MAX_VALUE]),
      elementTension: Float64Array.from([15000.123456789, 0]),
      elementSlack: Uint8Array.from([0, 1]),
    };
    const back = decodeCaseFields(encodeCaseFields(fields));
    expect(Array.from(back.positions)).toEqual(Array.from(fields.positions));
    expect(Object.is(back.positions[1], -0)).toBe(true);
    expect(Array.from(back.elementTension)).toEqual(Array.from(fields.elementTension));
    expect(Array.from(back.elementSlack)).toEqual([0, 1]);
  });

  it('refuses a reply of the wrong length or format', () => {
    const good = encodeCaseFields({ positions: new Float64Array(3), elementTension: new Float64Array(1), elementSlack: new Uint8Array(1) });
    expect(() => decodeCaseFields(good.slice(0, good.byteLength - 1))).toThrow(/length/);
    expect(() => decodeCaseFields(new ArrayBuffer(4))).toThrow(/header/);
    expect(() => decodeCaseFields(new ArrayBuffer(16))).toThrow(/format/);
  });
});
