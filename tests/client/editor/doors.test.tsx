// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import * as THREE from 'three';
import { defaultCatalogue } from '@/domain/catalogue';
import { createEmptyDesign } from '@/domain/design/create';
import { addProfile, addSlidingDoors } from '@/domain/design/operations';
import { findOpenings } from '@/domain/design/openings';
import { buildSceneLayout } from '@/components/viewer/sceneLayout';
import type { DesignDocument, Vec3 } from '@/domain/design/schema';
import { FillOpeningInspector } from '@/features/editor/inspectors/FillOpeningInspector';
import { renderWithStore } from './renderWithStore';

afterEach(cleanup);

/** A 600 × 500 mm clear opening framed by 40 mm profiles in the XY plane. */
function doorFrame(width = 600): DesignDocument {
  const profiles: { id: string; start: Vec3; direction: Vec3; length: number }[] = [
    { id: 'left', start: [-width / 2 - 20, 0, 0], direction: [0, 1, 0], length: 580 },
    { id: 'right', start: [width / 2 + 20, 0, 0], direction: [0, 1, 0], length: 580 },
    { id: 'bottom', start: [-width / 2, 20, 0], direction: [1, 0, 0], length: width },
    { id: 'top', start: [-width / 2, 560, 0], direction: [1, 0, 0], length: width },
  ];
  return profiles.reduce((d, p) => addProfile(d, p), createEmptyDesign({ name: 'Door frame', systemId: 'metric-40' }));
}

async function pickTheOpeningAndChoose(kindLabel: RegExp) {
  const user = userEvent.setup({ delay: null });
  await user.click(within(screen.getByRole('list', { name: 'Openings' })).getByRole('button'));
  await user.click(screen.getByRole('radio', { name: kindLabel }));
  return user;
}

describe('filling an opening with doors', () => {
  it('adds two overlapping door leaves and a track on both rails as one history entry, which undo removes', async () => {
    const { store } = renderWithStore(<FillOpeningInspector />, doorFrame());
    const user = await pickTheOpeningAndChoose(/Sliding doors/);
    await user.click(screen.getByRole('button', { name: 'Add sliding doors' }));

    const { design } = store.getState();
    expect(store.temporal.getState().pastStates).toHaveLength(1);
    expect(store.getState().historyLabel).toMatch(/^Add sliding doors/);
    const leaves = design.panels.filter((panel) => panel.role === 'door');
    expect(leaves).toHaveLength(2);
    expect(leaves[0].rect.width + leaves[1].rect.width).toBeGreaterThan(600);
    expect(design.accessories.filter((a) => a.kind === 'door-track').map((a) => a.profileId).sort()).toEqual(['bottom', 'top']);
    expect(design.accessories.filter((a) => a.kind === 'handle')).toHaveLength(2);
    expect(store.getState().selection).toEqual(expect.arrayContaining(leaves.map((leaf) => leaf.id)));

    store.getState().undo();
    expect(store.getState().design.panels).toEqual([]);
    expect(store.getState().design.accessories).toEqual([]);
  });

  it('adds a hinged door with hinges on the chosen upright as one history entry', async () => {
    const { store } = renderWithStore(<FillOpeningInspector />, doorFrame());
    const user = await pickTheOpeningAndChoose(/Hinged door/);
    await user.selectOptions(screen.getByLabelText('Hinges on'), 'right');
    await user.click(screen.getByRole('button', { name: 'Add hinged door' }));

    const { design } = store.getState();
    expect(store.temporal.getState().pastStates).toHaveLength(1);
    expect(design.panels.map((panel) => panel.role)).toEqual(['door']);
    expect(design.accessories.filter((a) => a.kind === 'hinge').map((a) => a.profileId)).toEqual(['right', 'right']);
  });

  it('shows why sliding doors do not fit a narrow opening and records nothing', async () => {
    const { store } = renderWithStore(<FillOpeningInspector />, doorFrame(150));
    const user = await pickTheOpeningAndChoose(/Sliding doors/);
    await user.click(screen.getByRole('button', { name: 'Add sliding doors' }));

    expect(screen.getByRole('alert')).toHaveTextContent(/need at least 200/);
    expect(store.temporal.getState().pastStates).toHaveLength(0);
    expect(store.getState().design.panels).toEqual([]);
  });

  it('still fills the opening with a plain panel by default', async () => {
    const { store } = renderWithStore(<FillOpeningInspector />, doorFrame());
    const user = userEvent.setup({ delay: null });
    await user.click(within(screen.getByRole('list', { name: 'Openings' })).getByRole('button'));
    expect(screen.getByRole('radio', { name: /Plain panel/ })).toBeChecked();
    await user.click(screen.getByRole('button', { name: 'Fill opening' }));
    expect(store.getState().design.panels.map((panel) => panel.mounting)).toEqual(['captured']);
  });
});

describe('drawing sliding doors', () => {
  const base = doorFrame();
  const withDoors = addSlidingDoors(base, { opening: findOpenings(base)[0], materialId: 'acrylic', thickness: 4 });
  const layout = buildSceneLayout(withDoors, defaultCatalogue);
  const instancesOf = (id: string) =>
    layout.batches.flatMap((batch) =>
      batch.partIds.flatMap((partId, i) => (partId === id ? [{ batch, matrix: new THREE.Matrix4().fromArray(batch.matrices, i * 16) }] : [])),
    );

  it('draws each track as one strip as long as the opening, on the rail face towards the leaves', () => {
    const tracks = withDoors.accessories.filter((a) => a.kind === 'door-track');
    for (const track of tracks) {
      const [drawn, ...more] = instancesOf(track.id);
      expect(more).toEqual([]);
      expect(drawn.batch.role).toBe('accessory');
      const position = new THREE.Vector3();
      const size = new THREE.Vector3();
      drawn.matrix.decompose(position, new THREE.Quaternion(), size);
      expect(new THREE.Vector3(1, 0, 0).transformDirection(drawn.matrix).x).toBeCloseTo(1);
      expect(size.x).toBeCloseTo(600);
      // The rails' front face is at z = 20 mm; the leaves stand in front of it.
      expect(position.z).toBeGreaterThan(20);
      expect(position.x).toBeCloseTo(0);
    }
  });

  it('draws both leaves as sheets and a handle on each', () => {
    for (const leaf of withDoors.panels) expect(instancesOf(leaf.id).map((i) => i.batch.role)).toEqual(['panel']);
    const handles = withDoors.accessories.filter((a) => a.kind === 'handle');
    expect(handles.flatMap((h) => instancesOf(h.id))).toHaveLength(2);
  });
});
