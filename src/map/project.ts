// Sites at their coordinates: an equirectangular projection centred on the design (x = λ·cos φ₀,
// y = −φ, with φ₀ the middle latitude of the extent; Snyder, "Map Projections — A Working
// Manual", USGS Prof. Paper 1395, 1987, §12), fitted into the drawing with its aspect kept.
// Longitudes are unwrapped across the largest empty arc, so a design that straddles the
// antimeridian stays in one piece. For the extent of one network (a country, a region) the
// distortion is small; it is a picture, never a measurement.

export const MAP_WIDTH = 760;
export const MAP_MAX_HEIGHT = 640;
export const MAP_MIN_HEIGHT = 260;
export const MAP_MARGIN = 36;

export interface Placed {
  x: Float64Array;
  y: Float64Array;
  width: number;
  height: number;
}

/** Round to 0.1 drawing units, so the same inputs give the same bytes on any engine. */
export function round1(v: number): number {
  const r = Math.round(v * 10) / 10;
  return Object.is(r, -0) ? 0 : r;
}

/** Longitudes shifted so that the largest empty arc lies outside their range. */
export function unwrapLongitudes(lon: readonly number[]): number[] {
  if (lon.length < 2) return [...lon];
  const norm = lon.map((l) => ((((l + 180) % 360) + 360) % 360) - 180);
  const sorted = [...new Set(norm)].sort((a, b) => a - b);
  let gap = sorted[0] + 360 - sorted[sorted.length - 1];
  let start = sorted[0];
  for (let i = 1; i < sorted.length; i++) {
    const d = sorted[i] - sorted[i - 1];
    if (d > gap) {
      gap = d;
      start = sorted[i];
    }
  }
  return norm.map((l) => (l < start ? l + 360 : l));
}

/** Fit plane coordinates into the drawing (y down), aspect kept, centred; rounded. */
export function fitToBox(
  px: readonly number[],
  py: readonly number[],
  width = MAP_WIDTH,
  maxHeight = MAP_MAX_HEIGHT,
  margin = MAP_MARGIN,
): Placed {
  const n = px.length;
  let x0 = Infinity;
  let x1 = -Infinity;
  let y0 = Infinity;
  let y1 = -Infinity;
  for (let i = 0; i < n; i++) {
    x0 = Math.min(x0, px[i]);
    x1 = Math.max(x1, px[i]);
    y0 = Math.min(y0, py[i]);
    y1 = Math.max(y1, py[i]);
  }
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  if (n === 0) return { x, y, width, height: MAP_MIN_HEIGHT };
  const spanX = x1 - x0;
  const spanY = y1 - y0;
  const innerW = width - 2 * margin;
  const innerH = maxHeight - 2 * margin;
  const s =
    spanX <= 0 && spanY <= 0
      ? 1
      : Math.min(spanX > 0 ? innerW / spanX : Infinity, spanY > 0 ? innerH / spanY : Infinity);
  const height = Math.max(MAP_MIN_HEIGHT, Math.min(maxHeight, Math.ceil(spanY * s + 2 * margin)));
  const offX = (width - spanX * s) / 2;
  const offY = (height - spanY * s) / 2;
  for (let i = 0; i < n; i++) {
    x[i] = round1(offX + (px[i] - x0) * s);
    y[i] = round1(offY + (py[i] - y0) * s);
  }
  return { x, y, width, height };
}

/** Project latitudes and longitudes (degrees) into the drawing. */
export function projectGeographic(lat: readonly number[], lon: readonly number[]): Placed {
  const lons = unwrapLongitudes(lon);
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of lat) {
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  const phi0 = lat.length ? ((lo + hi) / 2) * (Math.PI / 180) : 0;
  const k = Math.max(0.05, Math.cos(phi0));
  return fitToBox(
    lons.map((l) => l * k),
    lat.map((v) => -v),
  );
}
