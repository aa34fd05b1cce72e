/**
 * The finite-volume grid of the cycle solver: cells numbered from the surface inward,
 * widths growing geometrically so the cells are finest where carbon changes fastest.
 * Lengths in m. Volumes and face areas are per unit of carburized surface, so the
 * planar and the radial case share one set of equations.
 */

/** Cells at resolution 1 (measured: see the accuracy tests and the bench). */
export const BASE_CELLS = 48;
/** Ratio of the deepest to the surface cell width, the same at every resolution. */
export const WIDTH_STRETCH = 20;

export interface Grid {
  cells: number;
  /** Depth of the inner boundary (symmetry plane, bar axis or far field), m. */
  extentM: number;
  /** Depth of each cell centre below the surface, m. */
  centreDepthM: Float64Array;
  /** Distance from a cell centre to either of its faces, m (half the cell width). */
  halfWidthM: Float64Array;
  /** Cell volume per unit surface area, m. */
  volumeM: Float64Array;
  /** Area of face i (face 0 is the surface, face `cells` the inner boundary) per unit surface area. */
  faceArea: Float64Array;
}

/**
 * A grid over depth 0…extentM. `radiusM` makes it radial (round bar, cylindrical
 * volumes r·dr); without it the cells are planar. `resolution` multiplies the number of
 * cells while keeping the stretch, so every cell is split roughly in `resolution` parts.
 */
export function buildGrid(extentM: number, resolution: number, radiusM?: number): Grid {
  const cells = Math.max(4, Math.round(BASE_CELLS * resolution));
  const growth = WIDTH_STRETCH ** (1 / (cells - 1));
  const firstWidthM = (extentM * (growth - 1)) / (growth ** cells - 1);
  const centreDepthM = new Float64Array(cells);
  const halfWidthM = new Float64Array(cells);
  const volumeM = new Float64Array(cells);
  const faceArea = new Float64Array(cells + 1);
  // Radial area and volume relative to the surface: r/R and (r_out² − r_in²)/(2R).
  const areaAt = (depthM: number) => (radiusM === undefined ? 1 : Math.max(radiusM - depthM, 0) / radiusM);
  let faceDepthM = 0;
  let widthM = firstWidthM;
  faceArea[0] = 1;
  for (let i = 0; i < cells; i++) {
    // The last face lands exactly on the inner boundary, free of rounding drift.
    const nextFaceM = i === cells - 1 ? extentM : faceDepthM + widthM;
    const outerArea = areaAt(faceDepthM);
    const innerArea = areaAt(nextFaceM);
    centreDepthM[i] = (faceDepthM + nextFaceM) / 2;
    halfWidthM[i] = (nextFaceM - faceDepthM) / 2;
    volumeM[i] =
      radiusM === undefined ? nextFaceM - faceDepthM : ((outerArea + innerArea) / 2) * (nextFaceM - faceDepthM);
    faceArea[i + 1] = innerArea;
    faceDepthM = nextFaceM;
    widthM *= growth;
  }
  return { cells, extentM, centreDepthM, halfWidthM, volumeM, faceArea };
}
