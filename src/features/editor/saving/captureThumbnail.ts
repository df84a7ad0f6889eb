/** The scene's test and capture hook (editor-scene sets it while the canvas is mounted). */
interface SceneCaptureHook {
  capturePng?(width?: number): Promise<string>;
}

const MAX_THUMBNAIL_CHARS = 400 * 1024;
export const THUMBNAIL_WIDTH = 320;

/** A PNG data URL of the model for the revision list, or undefined when the scene cannot give one (a save never waits on it). */
export async function captureThumbnail(timeoutMs = 3000): Promise<string | undefined> {
  const hook = (window as unknown as { __slotwiseScene?: SceneCaptureHook }).__slotwiseScene;
  if (!hook?.capturePng) return undefined;
  try {
    const picture = await Promise.race([
      hook.capturePng(THUMBNAIL_WIDTH),
      new Promise<undefined>((resolve) => setTimeout(() => resolve(undefined), timeoutMs)),
    ]);
    if (typeof picture !== 'string' || !picture.startsWith('data:image/png;base64,')) return undefined;
    return picture.length <= MAX_THUMBNAIL_CHARS ? picture : undefined;
  } catch {
    return undefined;
  }
}
