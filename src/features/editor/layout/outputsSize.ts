/** The outputs area's height, remembered per person in this browser. px. */
export const OUTPUTS_MIN_HEIGHT = 160;
export const OUTPUTS_DEFAULT_HEIGHT = 300;
/** Below this window width the checks column and the inspector start folded. px. */
export const NARROW_WIDTH = 1280;

const keyFor = (userId: number | string | undefined) => `slotwise.editor.outputsHeight.${userId ?? 'anonymous'}`;

export function readOutputsHeight(userId: number | string | undefined): number {
  try {
    const value = Number(window.localStorage.getItem(keyFor(userId)));
    return Number.isFinite(value) && value >= OUTPUTS_MIN_HEIGHT ? value : OUTPUTS_DEFAULT_HEIGHT;
  } catch {
    return OUTPUTS_DEFAULT_HEIGHT;
  }
}

export function saveOutputsHeight(userId: number | string | undefined, height: number): void {
  try {
    window.localStorage.setItem(keyFor(userId), String(Math.round(height)));
  } catch {
    // Private windows may refuse storage; the size then lasts for this visit only.
  }
}

/** The tallest the area may grow: most of the window, leaving the model a strip. */
export const outputsMaxHeight = () => Math.max(OUTPUTS_MIN_HEIGHT, Math.round((typeof window === 'undefined' ? 900 : window.innerHeight) - 220));

export const isNarrowWindow = () => typeof window !== 'undefined' && window.innerWidth < NARROW_WIDTH;
