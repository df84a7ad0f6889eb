/**
 * A brushed-aluminium streak texture made in code (no image files, nothing from a CDN): grey
 * values that vary across the profile and not along it, so the instance's stretch along the
 * axis keeps the streaks straight.
 */
import * as THREE from 'three';

const WIDTH = 256;
const HEIGHT = 4;

/** Deterministic pseudo-random numbers, so every load looks the same (and screenshots compare). */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Grey streaks (0..255) across `WIDTH` columns: fine noise over a slow wave, smoothed once. */
export function brushedStreaks(seed = 7): Uint8Array {
  const random = mulberry32(seed);
  const raw = Array.from({ length: WIDTH }, (_, i) => 0.6 * random() + 0.4 * (0.5 + 0.5 * Math.sin((i / WIDTH) * Math.PI * 6 + random() * 0.3)));
  const smooth = raw.map((_, i) => (raw[(i + WIDTH - 1) % WIDTH] + 2 * raw[i] + raw[(i + 1) % WIDTH]) / 4);
  // Subtle: a 14% spread in brightness reads as brushing without looking striped.
  return Uint8Array.from(smooth, (v) => Math.round(220 + 35 * v));
}

/**
 * The streaks as a repeating texture; ExtrudeGeometry's side-wall UVs are u = across (mm) and
 * v = along the unit-length axis, so `repeat.x` sets how many mm one tile spans.
 */
export function createBrushedTexture(tileMm = 24): THREE.DataTexture {
  const streaks = brushedStreaks();
  const data = new Uint8Array(WIDTH * HEIGHT * 4);
  for (let y = 0; y < HEIGHT; y++) {
    for (let x = 0; x < WIDTH; x++) {
      const o = (y * WIDTH + x) * 4;
      data[o] = data[o + 1] = data[o + 2] = streaks[x];
      data[o + 3] = 255;
    }
  }
  const texture = new THREE.DataTexture(data, WIDTH, HEIGHT, THREE.RGBAFormat);
  texture.wrapS = THREE.RepeatWrapping;
  texture.wrapT = THREE.RepeatWrapping;
  texture.repeat.set(1 / tileMm, 1);
  texture.magFilter = THREE.LinearFilter;
  texture.minFilter = THREE.LinearMipmapLinearFilter;
  texture.generateMipmaps = true;
  texture.colorSpace = THREE.SRGBColorSpace;
  texture.needsUpdate = true;
  return texture;
}
