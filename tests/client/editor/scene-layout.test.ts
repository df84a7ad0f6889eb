import { describe, expect, it } from 'vitest';
import * as THREE from 'three';
import { defaultCatalogue } from '@/domain/catalogue';
import { designDocumentSchema, type DesignDocumentInput, CURRENT_SCHEMA_VERSION } from '@/domain/design/schema';
import type { DesignAnalysis } from '@/domain/analysis/types';
import { buildSceneLayout, profileMatrix } from '@/components/viewer/sceneLayout';
import { SceneResources } from '@/components/viewer/sceneResources';
import { worstSeverityByPart } from '@/components/viewer/partHighlight';
import { boundingSphereOf, fitDistance } from '@/components/viewer/cameraFraming';
import { renderModeFromUrl } from '@/components/viewer/renderMode';

function design(parts: Partial<DesignDocumentInput>) {
  return designDocumentSchema.parse({ schemaVersion: CURRENT_SCHEMA_VERSION, name: 'Scene layout test', systemId: 'metric-40', ...parts });
}

const rail = (id: string, start: [number, number, number], direction: [number, number, number], length: number, variantId = 'm40-40x40') => ({
  id,
  variantId,
  start,
  direction,
  length,
});

describe('profile instance matrices', () => {
  it('turns the unit extrusion so a profile along X has its section width along world Z and ends at start + length', () => {
    const m = profileMatrix({ start: [100, 20, 20], direction: [1, 0, 0], length: 500, rollDeg: 0 });
    const sectionX = new THREE.Vector3(1, 0, 0).transformDirection(m);
    expect(sectionX.toArray().map((v) => Math.round(v * 1e9) / 1e9)).toEqual([0, 0, 1]);
    const far = new THREE.Vector3(0, 0, 1).applyMatrix4(m);
    expect(far.toArray()).toEqual([600, 20, 20]);
  });

  it('keeps the basis right-handed so faces are not turned inside out', () => {
    for (const direction of [
      [1, 0, 0],
      [0, 1, 0],
      [0, 0, -1],
    ] as [number, number, number][]) {
      for (const rollDeg of [0, 90, 180]) {
        expect(profileMatrix({ start: [0, 0, 0], direction, length: 300, rollDeg }).determinant()).toBeGreaterThan(0);
      }
    }
  });

  it('turns a 40 x 80 section by its roll so the 80 mm side stands up or lies flat', () => {
    const upright = profileMatrix({ start: [0, 0, 0], direction: [0, 0, 1], length: 100, rollDeg: 0 });
    const rolled = profileMatrix({ start: [0, 0, 0], direction: [0, 0, 1], length: 100, rollDeg: 90 });
    const heightAxis = (m: THREE.Matrix4) => new THREE.Vector3(0, 1, 0).transformDirection(m).toArray().map((v) => Math.round(Math.abs(v)));
    expect(heightAxis(upright)).toEqual([0, 1, 0]);
    expect(heightAxis(rolled)).toEqual([1, 0, 0]);
  });
});

describe('scene batches', () => {
  it('draws all profiles of one variant as one batch, and a second variant as another', () => {
    const layout = buildSceneLayout(
      design({
        profiles: [
          rail('a', [0, 0, 0], [1, 0, 0], 500),
          rail('b', [0, 0, 400], [1, 0, 0], 500),
          rail('c', [0, 0, 0], [0, 1, 0], 700),
          rail('d', [0, 700, 0], [0, 0, 1], 400, 'm40-40x80'),
        ],
      }),
      defaultCatalogue,
    );
    const profileBatches = layout.batches.filter((b) => b.role === 'profile');
    expect(profileBatches).toHaveLength(2);
    const square = profileBatches.find((b) => b.geometry.kind === 'profile' && b.geometry.variantId === 'm40-40x40')!;
    expect(square.partIds).toEqual(['a', 'b', 'c']);
    expect(square.matrices).toHaveLength(3 * 16);
  });

  it('places a corner bracket with its two screws under the joint id, and a machining disc for an end tap', () => {
    const layout = buildSceneLayout(
      design({
        profiles: [
          { ...rail('post', [20, 0, 20], [0, 1, 0], 600), machining: [{ id: 'tap', kind: 'end-tap', fromEnd: 'start', offset: 0 }] },
          rail('beam', [40, 300, 20], [1, 0, 0], 500),
        ],
        joints: [
          {
            id: 'j1',
            kind: 'corner-bracket',
            connectorId: 'm40-corner-bracket',
            members: [
              { profileId: 'beam', at: 'start' },
              { profileId: 'post', at: 'span', along: 300 },
            ],
          },
        ],
      }),
      defaultCatalogue,
    );
    const connector = layout.batches.find((b) => b.role === 'connector')!;
    const screws = layout.batches.find((b) => b.role === 'fastener')!;
    const machining = layout.batches.find((b) => b.role === 'machining')!;
    expect(connector.partIds).toEqual(['j1']);
    expect(screws.partIds).toEqual(['j1', 'j1']);
    expect(machining.partIds).toEqual(['post']);
    // The bracket's corner sits on the post's face (x = 40), beside the beam.
    const corner = new THREE.Vector3().setFromMatrixPosition(new THREE.Matrix4().fromArray(connector.matrices));
    expect(corner.x).toBeCloseTo(40, 6);
  });

  it('instances plain sheets by material and draws sheets with cut-outs on their own', () => {
    const sheet = (id: string, cutouts: { id: string; kind: 'round'; u: number; v: number; diameter: number }[] = []) => ({
      id,
      materialId: 'acrylic',
      thickness: 6,
      mounting: 'captured' as const,
      rect: { center: [300, 300, 20] as [number, number, number], normal: 'z' as const, width: 500, height: 500 },
      cutouts,
    });
    const layout = buildSceneLayout(design({ panels: [sheet('s1'), sheet('s2'), sheet('s3', [{ id: 'hole', kind: 'round', u: 0, v: 0, diameter: 60 }])] }), defaultCatalogue);
    const panels = layout.batches.filter((b) => b.role === 'panel');
    expect(panels).toHaveLength(1);
    expect(panels[0].partIds).toEqual(['s1', 's2']);
    expect(layout.cutoutPanels.map((p) => p.id)).toEqual(['s3']);
  });
});

describe('scene resources', () => {
  it('extrudes each variant once, at unit length, with its slots and bores as real geometry', () => {
    const resources = new SceneResources(defaultCatalogue);
    const first = resources.profileGeometry('m40-40x40')!;
    expect(resources.profileGeometry('m40-40x40')).toBe(first);
    const box = first.boundingBox!;
    expect(box.min.z).toBeCloseTo(0, 9);
    expect(box.max.z).toBeCloseTo(1, 9);
    expect(box.max.x - box.min.x).toBeCloseTo(40, 1);
    // A plain square bar has 12 triangles; slots, lips and bores make hundreds.
    expect(first.index!.count / 3).toBeGreaterThan(200);
    resources.dispose();
  });

  it('lets go of every geometry, material and texture on dispose', () => {
    const resources = new SceneResources(defaultCatalogue);
    resources.profileGeometry('m20-20x20');
    resources.hardwareGeometry('bracket');
    resources.surface('aluminium');
    resources.panelSurface('acrylic');
    const disposed: string[] = [];
    const geometry = resources.hardwareGeometry('foot');
    geometry.addEventListener('dispose', () => disposed.push('foot'));
    expect(resources.counts().textures).toBe(1);
    resources.dispose();
    expect(resources.counts()).toEqual({ geometries: 0, materials: 0, textures: 0 });
    expect(disposed).toEqual(['foot']);
  });

  it('makes clear acrylic see-through and plywood opaque', () => {
    const resources = new SceneResources(defaultCatalogue);
    expect(resources.panelSurface('acrylic').transparent).toBe(true);
    expect(resources.panelSurface('plywood').transparent).toBe(false);
    resources.dispose();
  });
});

describe('finding markers and framing', () => {
  it('marks a part with the worst severity among the findings that name it', () => {
    const analysis = {
      findings: [
        { id: 'f1', check: 'joints', severity: 'note', partIds: ['a'], message: 'note' },
        { id: 'f2', check: 'joints', severity: 'error', partIds: ['a', 'b'], message: 'error' },
        { id: 'f3', check: 'joints', severity: 'warning', partIds: ['b'], message: 'warning' },
      ],
    } as unknown as DesignAnalysis;
    const worst = worstSeverityByPart(analysis);
    expect(worst.get('a')).toBe('error');
    expect(worst.get('b')).toBe('error');
    expect(worstSeverityByPart(null).size).toBe(0);
  });

  it('frames only the selected parts, close enough that they fill the view', () => {
    const layout = buildSceneLayout(design({ profiles: [rail('near', [0, 0, 0], [1, 0, 0], 400), rail('far', [5000, 0, 0], [1, 0, 0], 400)] }), defaultCatalogue);
    const one = boundingSphereOf(layout.anchors, ['near']);
    const all = boundingSphereOf(layout.anchors, 'all');
    expect(one.center.x).toBeCloseTo(200, 6);
    expect(all.radius).toBeGreaterThan(2500);
    expect(fitDistance(one, 40, 1.6)).toBeLessThan(fitDistance(all, 40, 1.6) / 5);
  });

  it('switches to one mesh per part only when the URL asks for it', () => {
    expect(renderModeFromUrl('?renderMode=per-part')).toBe('per-part');
    expect(renderModeFromUrl('?renderMode=other')).toBe('instanced');
    expect(renderModeFromUrl('')).toBe('instanced');
  });
});
