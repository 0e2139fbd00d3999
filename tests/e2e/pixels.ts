/**
 * Pixel checks on a PNG screenshot, decoded in the page itself (an <img> drawn into a 2D canvas),
 * so no PNG library is needed in Node.
 */
import type { Page } from 'playwright-core';

export interface PixelStats {
  total: number;
  /** Pixels differing from the background colour by more than 40 (sum of |ΔRGB|). */
  nonBackground: number;
  /** Pixels within `tolerance` of each target colour (same order as the targets). */
  matches: number[];
}

/** `targets` are sRGB 0..255 triples; `background` likewise. */
export async function pixelStats(page: Page, png: Buffer, background: number[], targets: number[][], tolerance = 40): Promise<PixelStats> {
  const dataUrl = `data:image/png;base64,${png.toString('base64')}`;
  return page.evaluate(async ({ dataUrl, background, targets, tolerance }) => {
    const img = new Image();
    img.src = dataUrl;
    await img.decode();
    const c = document.createElement('canvas');
    c.width = img.width;
    c.height = img.height;
    const g = c.getContext('2d')!;
    g.drawImage(img, 0, 0);
    const d = g.getImageData(0, 0, c.width, c.height).data;
    let nonBackground = 0;
    const matches = targets.map(() => 0);
    for (let i = 0; i < d.length; i += 4) {
      const r = d[i], gg = d[i + 1], b = d[i + 2];
      if (Math.abs(r - background[0]) + Math.abs(gg - background[1]) + Math.abs(b - background[2]) > 40) nonBackground++;
      targets.forEach((t, k) => {
        if (Math.abs(r - t[0]) + Math.abs(gg - t[1]) + Math.abs(b - t[2]) <= tolerance) matches[k]++;
      });
    }
    return { total: d.length / 4, nonBackground, matches };
  }, { dataUrl, background, targets, tolerance });
}
