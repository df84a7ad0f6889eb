/// <reference types="webxr" />
/**
 * Feature detection for "See it in the room", without loading three: a WebXR immersive-ar session
 * (Android browsers with ARCore, headsets) and links that open USDZ in the phone's own AR viewer.
 */

/** Whether this browser can start an immersive-ar session (false where WebXR is missing). */
export async function arSupported(): Promise<boolean> {
  try {
    return (await navigator.xr?.isSessionSupported('immersive-ar')) ?? false;
  } catch {
    return false;
  }
}

/** Whether links with rel="ar" open a USDZ file in the phone's own AR viewer. */
export function quickLookSupported(): boolean {
  try {
    return document.createElement('a').relList.supports('ar');
  } catch {
    return false;
  }
}
