/// <reference types="webxr" />
import * as THREE from 'three';
import type { DesignDocument } from '@/domain/design/schema';
import { designToScene } from './gltfExport';

/**
 * "See it in the room": a WebXR immersive-ar session showing the design at true scale (the export
 * scene, metres). Where the browser offers hit testing, a ring follows the floor under the phone's
 * aim and a tap puts the piece there, its front facing the person; without it, the piece stands
 * 1.5 m ahead of the starting position. Lazy-loaded: only a press of the button brings three's
 * renderer for it. Returns a function that ends the session.
 */
export async function startArSession(design: DesignDocument, overlay: HTMLElement, onEnd: () => void): Promise<() => void> {
  const xr = navigator.xr;
  if (!xr) throw new Error('This browser offers no augmented reality session.');
  const session = await xr.requestSession('immersive-ar', {
    optionalFeatures: ['hit-test', 'dom-overlay', 'local-floor'],
    domOverlay: { root: overlay },
  });

  const renderer = new THREE.WebGLRenderer({ antialias: true, alpha: true });
  renderer.setPixelRatio(window.devicePixelRatio);
  renderer.setSize(window.innerWidth, window.innerHeight);
  renderer.xr.enabled = true;
  renderer.xr.setReferenceSpaceType('local');
  const scene = new THREE.Scene();
  const camera = new THREE.PerspectiveCamera(70, window.innerWidth / window.innerHeight, 0.01, 50);
  scene.add(new THREE.HemisphereLight(0xffffff, 0x8a8f96, 2.2));
  const sun = new THREE.DirectionalLight(0xffffff, 1.4);
  sun.position.set(1, 3, 2);
  scene.add(sun);

  // The piece with its base centred on the origin, so it stands on the placed point.
  const piece = new THREE.Group();
  const exported = designToScene(design);
  const frame = exported.children[0];
  const box = new THREE.Box3().setFromObject(frame);
  const centre = box.getCenter(new THREE.Vector3());
  frame.position.set(-centre.x, -box.min.y, -centre.z);
  piece.add(frame);
  piece.visible = false;
  scene.add(piece);

  const reticle = new THREE.Mesh(new THREE.RingGeometry(0.12, 0.16, 40).rotateX(-Math.PI / 2), new THREE.MeshBasicMaterial({ color: 0x0b7a75 }));
  reticle.matrixAutoUpdate = false;
  reticle.visible = false;
  scene.add(reticle);

  let hitSource: XRHitTestSource | null = null;
  try {
    const viewerSpace = await session.requestReferenceSpace('viewer');
    hitSource = (await session.requestHitTestSource?.({ space: viewerSpace })) ?? null;
  } catch {
    hitSource = null;
  }
  await renderer.xr.setSession(session);

  const placeAt = (position: THREE.Vector3) => {
    piece.position.copy(position);
    // Front is -Z in the design: turn the piece so its front faces the person.
    const eye = new THREE.Vector3().setFromMatrixPosition(renderer.xr.getCamera().matrixWorld);
    piece.rotation.y = Math.atan2(-(eye.x - position.x), -(eye.z - position.z));
    piece.visible = true;
  };
  if (!hitSource) {
    // No floor finding: 1.5 m ahead and 1.2 m below a phone held at chest height (common practice, no source).
    placeAt(new THREE.Vector3(0, -1.2, -1.5));
  }
  const controller = renderer.xr.getController(0);
  controller.addEventListener('select', () => {
    if (reticle.visible) placeAt(new THREE.Vector3().setFromMatrixPosition(reticle.matrix));
  });
  scene.add(controller);

  renderer.setAnimationLoop((_time, xrFrame) => {
    const space = renderer.xr.getReferenceSpace();
    if (xrFrame && hitSource && space) {
      const pose = xrFrame.getHitTestResults(hitSource)[0]?.getPose(space);
      reticle.visible = Boolean(pose);
      if (pose) reticle.matrix.fromArray(pose.transform.matrix);
    }
    renderer.render(scene, camera);
  });

  let ended = false;
  session.addEventListener('end', () => {
    if (ended) return;
    ended = true;
    renderer.setAnimationLoop(null);
    hitSource?.cancel();
    scene.traverse((object) => {
      const mesh = object as THREE.Mesh;
      if (mesh.isMesh) {
        mesh.geometry.dispose();
        for (const material of Array.isArray(mesh.material) ? mesh.material : [mesh.material]) material.dispose();
      }
    });
    renderer.dispose();
    onEnd();
  });
  return () => {
    if (!ended) void session.end().catch(() => undefined);
  };
}

