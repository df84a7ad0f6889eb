/**
 * Whether WebGL is drawn by the CPU (SwiftShader, llvmpipe and the like: headless browsers,
 * machines without a usable GPU). There every multisampled pixel and blur pass costs real time,
 * so the viewer turns antialiasing off and draws a coarser contact shadow. Asked once per page
 * with a throw-away context, then remembered.
 */
let answer: boolean | undefined;

const SOFTWARE = /swiftshader|llvmpipe|softpipe|software|basic render/i;

export function isSoftwareRenderer(): boolean {
  if (answer !== undefined) return answer;
  answer = false;
  if (typeof document === 'undefined') return answer;
  try {
    const canvas = document.createElement('canvas');
    const context = (canvas.getContext('webgl2') ?? canvas.getContext('webgl')) as WebGLRenderingContext | null;
    if (!context) return answer;
    const info = context.getExtension('WEBGL_debug_renderer_info');
    const renderer = String(context.getParameter(info ? info.UNMASKED_RENDERER_WEBGL : context.RENDERER) ?? '');
    answer = SOFTWARE.test(renderer);
    context.getExtension('WEBGL_lose_context')?.loseContext();
  } catch {
    // No WebGL answer: keep the GPU defaults.
  }
  return answer;
}

/** For tests: forget the remembered answer. */
export function forgetSoftwareRenderer(): void {
  answer = undefined;
}
