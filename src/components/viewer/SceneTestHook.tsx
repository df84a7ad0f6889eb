import { useEffect } from 'react';
import { useThree } from '@react-three/fiber';
import * as THREE from 'three';
import { useScene } from './sceneContext';

/** What the page exposes as `window.__slotwiseScene` while the editor canvas is mounted. */
export interface SlotwiseSceneHook {
  /** Renders a frame now and reports the renderer's figures for it. */
  renderInfo(): { calls: number; triangles: number; geometries: number; textures: number };
  /** Renders a frame and returns it as a PNG data URL, scaled to `width` px wide when given. */
  capturePng(width?: number): Promise<string>;
  /** Instanced meshes in the scene that draw at least one instance. */
  instancedMeshCount(): number;
  /** Where a world point (mm) appears on the page, in CSS pixels from the page's top left. */
  worldToScreen(point: [number, number, number]): { x: number; y: number };
  /** Median time of `frames` synchronous renders (each waited for with a 1-pixel read), ms. */
  frameTimeMs(frames?: number): number;
  /** Median script time of `frames` step-player frames (matrices of the largest step rewritten, no render), ms; null without a player. */
  playerFrameMs(frames?: number): number | null;
  /** Profiles currently drawn (instances or meshes), and the render mode. */
  stats(): { profilesDrawn: number; renderMode: string; objects: number };
  /** Geometries, materials and textures the scene cache holds, and the renderer's memory figures. */
  memory(): { cache: { geometries: number; materials: number; textures: number }; renderer: { geometries: number; textures: number } };
}

declare global {
  interface Window {
    __slotwiseScene?: SlotwiseSceneHook;
  }
}

/** Installs `window.__slotwiseScene` for tests and thumbnails; removes it on unmount. Takes no props. */
export function SceneTestHook() {
  const gl = useThree((s) => s.gl);
  const scene = useThree((s) => s.scene);
  const camera = useThree((s) => s.camera);
  const { resources, renderMode, playerProbe } = useScene();

  useEffect(() => {
    const render = () => {
      camera.updateMatrixWorld();
      gl.render(scene, camera);
    };
    const hook: SlotwiseSceneHook = {
      renderInfo() {
        render();
        const { calls, triangles } = gl.info.render;
        const { geometries, textures } = gl.info.memory;
        return { calls, triangles, geometries, textures };
      },
      async capturePng(width) {
        // Render and read in the same task: the drawing buffer is not preserved between frames.
        render();
        const source = gl.domElement;
        if (!width || width >= source.width) return source.toDataURL('image/png');
        const target = document.createElement('canvas');
        target.width = Math.round(width);
        target.height = Math.max(1, Math.round((source.height / source.width) * width));
        const context = target.getContext('2d');
        if (!context) return source.toDataURL('image/png');
        context.drawImage(source, 0, 0, target.width, target.height);
        return target.toDataURL('image/png');
      },
      instancedMeshCount() {
        let count = 0;
        scene.traverseVisible((o) => {
          if ((o as THREE.InstancedMesh).isInstancedMesh && (o as THREE.InstancedMesh).count > 0) count++;
        });
        return count;
      },
      worldToScreen([x, y, z]) {
        camera.updateMatrixWorld();
        const p = new THREE.Vector3(x, y, z).project(camera);
        const rect = gl.domElement.getBoundingClientRect();
        return { x: rect.left + ((p.x + 1) / 2) * rect.width, y: rect.top + ((1 - p.y) / 2) * rect.height };
      },
      frameTimeMs(frames = 20) {
        const context = gl.getContext();
        const pixel = new Uint8Array(4);
        const times: number[] = [];
        render();
        for (let i = 0; i < frames; i++) {
          const started = performance.now();
          render();
          context.readPixels(0, 0, 1, 1, context.RGBA, context.UNSIGNED_BYTE, pixel);
          times.push(performance.now() - started);
        }
        times.sort((a, b) => a - b);
        return times[Math.floor(times.length / 2)];
      },
      playerFrameMs(frames = 30) {
        const probe = playerProbe.current;
        if (!probe) return null;
        const times: number[] = [];
        for (let i = 0; i < frames; i++) {
          const started = performance.now();
          probe();
          times.push(performance.now() - started);
        }
        times.sort((a, b) => a - b);
        return times[Math.floor(times.length / 2)];
      },
      stats() {
        let profilesDrawn = 0;
        let objects = 0;
        scene.traverse((o) => {
          objects++;
          if (!o.name.startsWith('batch:profile|')) return;
          profilesDrawn += (o as THREE.InstancedMesh).isInstancedMesh ? (o as THREE.InstancedMesh).count : o.children.length;
        });
        return { profilesDrawn, renderMode, objects };
      },
      memory() {
        return { cache: resources.counts(), renderer: { geometries: gl.info.memory.geometries, textures: gl.info.memory.textures } };
      },
    };
    window.__slotwiseScene = hook;
    return () => {
      if (window.__slotwiseScene === hook) delete window.__slotwiseScene;
    };
  }, [gl, scene, camera, resources, renderMode, playerProbe]);

  return null;
}
