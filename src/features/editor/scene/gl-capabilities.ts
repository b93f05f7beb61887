let software: boolean | null = null;

/**
 * True when WebGL runs in software (SwiftShader, llvmpipe): there multisampling costs
 * three to four times the frame, so the editor draws without it. Probed once on a
 * throwaway context whose resources are released at once.
 */
export function isSoftwareWebGl(): boolean {
  if (software !== null) return software;
  try {
    const canvas = document.createElement('canvas');
    const gl = (canvas.getContext('webgl2') ?? canvas.getContext('webgl')) as WebGLRenderingContext | null;
    if (!gl) return (software = true);
    const info = gl.getExtension('WEBGL_debug_renderer_info');
    const renderer = String(gl.getParameter(info ? info.UNMASKED_RENDERER_WEBGL : gl.RENDERER));
    gl.getExtension('WEBGL_lose_context')?.loseContext();
    software = /swiftshader|llvmpipe|softpipe|software/i.test(renderer);
  } catch {
    software = false;
  }
  return software;
}
