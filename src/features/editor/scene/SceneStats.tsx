import { useFrame, useThree } from '@react-three/fiber';

/** Frame figures the benchmark reads; written by mutation in the frame loop, never React state. */
export type SceneStatsRecord = { frames: number; lastFrameAt: number; drawCalls: number; triangles: number };

declare global {
  interface Window {
    __tacklineSceneStats?: SceneStatsRecord;
  }
}

/** Only on when the page URL asks for it (`?sceneStats=1`), so normal use pays nothing. */
export const SCENE_STATS_ENABLED = typeof window !== 'undefined' && new URLSearchParams(window.location.search).has('sceneStats');

/** Records frames rendered and draw calls for the browser benchmark. */
export function SceneStats() {
  const gl = useThree((s) => s.gl);
  useFrame(() => {
    const stats = (window.__tacklineSceneStats ??= { frames: 0, lastFrameAt: 0, drawCalls: 0, triangles: 0 });
    stats.frames += 1;
    stats.lastFrameAt = performance.now();
    stats.drawCalls = gl.info.render.calls;
    stats.triangles = gl.info.render.triangles;
  });
  return null;
}
