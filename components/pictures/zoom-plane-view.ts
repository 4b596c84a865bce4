import type { PlaneView } from './fit-plane-view';

/** The fitted box seen `zoom` times closer (zoom > 1) or farther (zoom < 1), about its centre (0, 0). */
export function zoomPlaneView(box: PlaneView, zoom: number): PlaneView {
  return { minRe: box.minRe / zoom, maxRe: box.maxRe / zoom, minIm: box.minIm / zoom, maxIm: box.maxIm / zoom };
}
