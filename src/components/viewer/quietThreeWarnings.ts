import { getConsoleFunction, setConsoleFunction } from 'three';

/**
 * The one three.js warning Slotwise silences: three r183 deprecated `THREE.Clock`, and
 * @react-three/fiber 9.8.2 (the newest release) still makes one for every canvas it creates, so every
 * viewer would log it. Nothing of ours uses Clock. Only this exact message is dropped; every other
 * three.js log, warning and error still reaches the console. Remove this when fiber moves to THREE.Timer.
 */
export const FIBER_CLOCK_DEPRECATION = 'THREE.Clock: This module has been deprecated. Please use THREE.Timer instead.';

let installed = false;

export function quietThreeWarnings(): void {
  if (installed) return;
  installed = true;
  const previous = getConsoleFunction() as ReturnType<typeof getConsoleFunction> | null;
  setConsoleFunction((type, message, ...params) => {
    if (type === 'warn' && message === FIBER_CLOCK_DEPRECATION) return;
    if (previous) return previous(type, message, ...params);
    console[type](message, ...params);
  });
}
