/**
 * Every geometry, material and texture the editor scene uses, made once and shared by all parts
 * (profiles of one variant share one unit-length extrusion), and disposed together on unmount.
 */
import * as THREE from 'three';
import type { Catalogue } from '@/domain/catalogue';
import { createBrushedTexture } from './brushedTexture';
import { createHardwareGeometry, type HardwareShape } from './hardwareGeometry';
import { createProfileSectionGeometry } from './profileSectionGeometry';

export type SurfaceKey = 'aluminium' | 'cast' | 'steel' | 'rubber' | 'plastic' | 'machining' | 'badge' | 'opening' | 'preview';

export class SceneResources {
  private readonly geometries = new Map<string, THREE.BufferGeometry>();
  private readonly materials = new Map<string, THREE.Material>();
  private readonly textures: THREE.Texture[] = [];

  constructor(private readonly catalogue: Catalogue) {}

  /** The shared unit-length extrusion of a variant's real cross-section, or null for an unknown variant. */
  profileGeometry(variantId: string): THREE.BufferGeometry | null {
    const key = `profile:${variantId}`;
    const cached = this.geometries.get(key);
    if (cached) return cached;
    const variant = this.catalogue.variants.find((v) => v.id === variantId);
    if (!variant) return null;
    const geometry = createProfileSectionGeometry(variant.crossSection);
    this.geometries.set(key, geometry);
    return geometry;
  }

  hardwareGeometry(shape: HardwareShape): THREE.BufferGeometry {
    return this.cached(`hardware:${shape}`, () => createHardwareGeometry(shape));
  }

  /** A one-off geometry (a panel with cut-outs) kept under `key` until `releaseGeometry`. */
  ownedGeometry(key: string, make: () => THREE.BufferGeometry): THREE.BufferGeometry {
    return this.cached(`owned:${key}`, make);
  }

  releaseGeometry(key: string): void {
    const full = `owned:${key}`;
    this.geometries.get(full)?.dispose();
    this.geometries.delete(full);
  }

  /** Keys of the one-off geometries currently held. */
  ownedKeys(): string[] {
    return [...this.geometries.keys()].filter((k) => k.startsWith('owned:')).map((k) => k.slice(6));
  }

  surface(key: SurfaceKey): THREE.Material {
    const existing = this.materials.get(key);
    if (existing) return existing;
    const material = this.makeSurface(key);
    this.materials.set(key, material);
    return material;
  }

  /** A panel material true to its catalogue colour and opacity (clear acrylic is see-through). */
  panelSurface(materialId: string): THREE.Material {
    const key = `panel:${materialId}`;
    const existing = this.materials.get(key);
    if (existing) return existing;
    const spec = this.catalogue.panelMaterials.find((m) => m.id === materialId);
    const opacity = spec?.opacity ?? 1;
    const material = new THREE.MeshStandardMaterial({
      color: spec?.color ?? '#d9dcd8',
      metalness: spec?.id.includes('alumin') || spec?.appearance === 'perforated' ? 0.6 : 0.05,
      roughness: spec?.appearance === 'clear' ? 0.08 : 0.65,
      transparent: opacity < 1,
      opacity,
      // See-through sheets must not hide the frame behind them.
      depthWrite: opacity >= 1,
      side: opacity < 1 ? THREE.DoubleSide : THREE.FrontSide,
    });
    this.materials.set(key, material);
    return material;
  }

  /** Geometries, materials and textures held right now (for the memory check). */
  counts(): { geometries: number; materials: number; textures: number } {
    return { geometries: this.geometries.size, materials: this.materials.size, textures: this.textures.length };
  }

  dispose(): void {
    for (const g of this.geometries.values()) g.dispose();
    for (const m of this.materials.values()) m.dispose();
    for (const t of this.textures) t.dispose();
    this.geometries.clear();
    this.materials.clear();
    this.textures.length = 0;
  }

  private cached(key: string, make: () => THREE.BufferGeometry): THREE.BufferGeometry {
    let geometry = this.geometries.get(key);
    if (!geometry) {
      geometry = make();
      this.geometries.set(key, geometry);
    }
    return geometry;
  }

  private makeSurface(key: SurfaceKey): THREE.Material {
    switch (key) {
      case 'aluminium': {
        const streaks = createBrushedTexture();
        this.textures.push(streaks);
        // Brushed, clear-anodised: bright, fairly metallic, streaks in colour and roughness.
        return new THREE.MeshStandardMaterial({ color: '#d4d9de', metalness: 0.72, roughness: 0.36, map: streaks, roughnessMap: streaks });
      }
      case 'cast':
        return new THREE.MeshStandardMaterial({ color: '#9aa2a9', metalness: 0.6, roughness: 0.5 });
      case 'steel':
        return new THREE.MeshStandardMaterial({ color: '#3a3f45', metalness: 0.55, roughness: 0.4 });
      case 'rubber':
        return new THREE.MeshStandardMaterial({ color: '#26292c', metalness: 0.05, roughness: 0.85 });
      case 'plastic':
        return new THREE.MeshStandardMaterial({ color: '#2f3338', metalness: 0, roughness: 0.7 });
      case 'machining':
        return new THREE.MeshBasicMaterial({ color: '#15181b', polygonOffset: true, polygonOffsetFactor: -2, polygonOffsetUnits: -2 });
      case 'badge':
        // Badges stay visible through the frame; colour per instance gives the severity.
        return new THREE.MeshBasicMaterial({ color: '#ffffff', depthTest: false, transparent: true, opacity: 0.95 });
      case 'opening':
        return new THREE.MeshBasicMaterial({ color: '#0b7a75', transparent: true, opacity: 0.22, depthWrite: false, side: THREE.DoubleSide });
      case 'preview':
        return new THREE.MeshStandardMaterial({ color: '#0b7a75', metalness: 0.3, roughness: 0.5, transparent: true, opacity: 0.55, depthWrite: false });
    }
  }
}
