import type { Page } from 'playwright-core';

/**
 * Counts the pixels of a PNG that differ from a background colour by more than `tolerance` per channel.
 * The PNG is decoded by the page itself (createImageBitmap), so the test needs no image library.
 */
export async function pixelsUnlike(
  page: Page,
  png: Buffer,
  background: [number, number, number],
  tolerance = 24,
): Promise<{ differing: number; total: number }> {
  return page.evaluate(
    async ({ base64, bg, tol }) => {
      const bytes = Uint8Array.from(atob(base64), (c) => c.charCodeAt(0));
      const bitmap = await createImageBitmap(new Blob([bytes], { type: 'image/png' }));
      const canvas = new OffscreenCanvas(bitmap.width, bitmap.height);
      const ctx = canvas.getContext('2d');
      if (!ctx) throw new Error('no 2D context');
      ctx.drawImage(bitmap, 0, 0);
      const data = ctx.getImageData(0, 0, bitmap.width, bitmap.height).data;
      let differing = 0;
      for (let i = 0; i < data.length; i += 4) {
        if (
          Math.abs(data[i]! - bg[0]) > tol ||
          Math.abs(data[i + 1]! - bg[1]) > tol ||
          Math.abs(data[i + 2]! - bg[2]) > tol
        )
          differing++;
      }
      return { differing, total: data.length / 4 };
    },
    { base64: png.toString('base64'), bg: background, tol: tolerance },
  );
}
