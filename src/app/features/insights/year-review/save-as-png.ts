import { toPng } from 'html-to-image';

/** Marks parts of a page left out of its image (the "Show as a table" of charts). */
export const LEFT_OUT_OF_IMAGE = 'data-not-in-image';

/**
 * Draws `element` as a PNG and hands it to the browser as a download named `fileName`. The
 * fonts the element uses are embedded, so the image reads the same on any device.
 */
export async function saveAsPng(element: HTMLElement, fileName: string): Promise<void> {
  const url = await toPng(element, {
    pixelRatio: 2,
    backgroundColor: getComputedStyle(element).backgroundColor,
    filter: (node) => !(node instanceof HTMLElement && node.hasAttribute(LEFT_OUT_OF_IMAGE)),
  });
  const link = element.ownerDocument.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
}
