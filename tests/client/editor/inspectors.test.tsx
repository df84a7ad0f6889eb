// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { designDocumentSchema, CURRENT_SCHEMA_VERSION } from '@/domain/design/schema';
import { ProfileInspector } from '@/features/editor/inspectors/ProfileInspector';
import { PanelInspector } from '@/features/editor/inspectors/PanelInspector';
import { InspectorContent } from '@/features/editor/inspectors/InspectorContent';
import { JointInspector } from '@/features/editor/inspectors/JointInspector';
import { applyOperation } from '@/domain/design/operations';
import { useEditorStore } from '@/features/editor/store/editorStore';
import { renderWithStore } from './renderWithStore';
import { twoRailDesign } from './fixtures';

function LiveProfileInspector({ id }: { id: string }) {
  const profile = useEditorStore((state) => state.design.profiles.find((p) => p.id === id));
  return profile ? <ProfileInspector profile={profile} /> : null;
}

afterEach(cleanup);

const lengthBox = () => screen.getByRole('textbox', { name: 'Length' });

describe('profile inspector', () => {
  it.each([
    ['-5', /cannot be negative/],
    ['0', /more than zero/],
    ['abc', /Could not read/],
    ['', /Enter a length/],
  ])('refuses %j with a message beside the field and leaves the design unchanged', async (typed, message) => {
    const { store } = renderWithStore(<LiveProfileInspector id="p1" />, twoRailDesign());
    const before = store.getState().design;
    const user = userEvent.setup({ delay: null });
    await user.clear(lengthBox());
    if (typed) await user.type(lengthBox(), typed);
    await user.keyboard('{Enter}');
    expect(screen.getByRole('alert')).toHaveTextContent(message);
    expect(lengthBox()).toHaveAttribute('aria-invalid', 'true');
    expect(store.getState().design).toBe(before);
    expect(store.temporal.getState().pastStates).toHaveLength(0);
  });

  it('commits a typed length on Enter as one undoable command', async () => {
    const { store } = renderWithStore(<LiveProfileInspector id="p1" />, twoRailDesign());
    const user = userEvent.setup({ delay: null });
    await user.clear(lengthBox());
    await user.type(lengthBox(), '750{Enter}');
    expect(store.getState().design.profiles[0].length).toBe(750);
    expect(store.temporal.getState().pastStates).toHaveLength(1);
    expect(store.getState().historyLabel).toBe('Set length of the profile to 750 mm');
    act(() => store.getState().undo());
    expect(store.getState().design.profiles[0].length).toBe(500);
    expect(lengthBox()).toHaveValue('500 mm');
  });

  it('reads inch fractions when the units are inches and shows the length back as a fraction', async () => {
    const { store } = renderWithStore(<LiveProfileInspector id="p1" />, twoRailDesign(), 'in');
    expect(lengthBox()).toHaveValue('19-11/16 in');
    const user = userEvent.setup({ delay: null });
    await user.clear(lengthBox());
    await user.type(lengthBox(), '23-7/16');
    fireEvent.blur(lengthBox());
    // 23 7/16 in = 595.3125 mm exactly (25.4 mm per inch, by definition).
    expect(store.getState().design.profiles[0].length).toBeCloseTo(595.3125, 9);
    expect(lengthBox()).toHaveValue('23-7/16 in');
  });

  it('moves the start point by a typed coordinate, zero and negative allowed', async () => {
    const { store } = renderWithStore(<LiveProfileInspector id="p2" />, twoRailDesign());
    const user = userEvent.setup({ delay: null });
    const x = screen.getByRole('textbox', { name: 'X' });
    await user.clear(x);
    await user.type(x, '-120{Enter}');
    expect(store.getState().design.profiles[1].start).toEqual([-120, 400, 0]);
  });

  it('changes the roll in quarter turns as one command', async () => {
    const { store } = renderWithStore(<LiveProfileInspector id="p1" />, twoRailDesign());
    const user = userEvent.setup({ delay: null });
    await user.selectOptions(screen.getByRole('combobox', { name: 'Roll about its own axis' }), '90');
    expect(store.getState().design.profiles[0].rollDeg).toBe(90);
    expect(store.temporal.getState().pastStates).toHaveLength(1);
  });
});

function framedPanelDesign() {
  return designDocumentSchema.parse({
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name: 'Framed panel',
    systemId: 'metric-40',
    profiles: [
      { id: 'b', variantId: 'm40-40x40', length: 600, start: [0, 0, 0], direction: [1, 0, 0] },
      { id: 't', variantId: 'm40-40x40', length: 600, start: [0, 440, 0], direction: [1, 0, 0] },
      { id: 'l', variantId: 'm40-40x40', length: 400, start: [20, 20, 0], direction: [0, 1, 0] },
      { id: 'r', variantId: 'm40-40x40', length: 400, start: [580, 20, 0], direction: [0, 1, 0] },
    ],
    panels: [
      { id: 'panel-1', materialId: 'acrylic', thickness: 4, mounting: 'captured', boundedBy: ['b', 't', 'l', 'r'], rect: { center: [300, 220, 0], normal: 'z', width: 520, height: 400 } },
    ],
  });
}

function LivePanelInspector() {
  const panel = useEditorStore((state) => state.design.panels[0]);
  return <PanelInspector panel={panel} />;
}

describe('panel inspector', () => {
  it('refuses a captured panel thicker than the slot and says why', async () => {
    const { store } = renderWithStore(<LivePanelInspector />, framedPanelDesign());
    const before = store.getState().design;
    const user = userEvent.setup({ delay: null });
    const thickness = screen.getByRole('textbox', { name: 'Thickness' });
    await user.clear(thickness);
    await user.type(thickness, '10{Enter}');
    // The metric 40 slot opening is 8 mm (domain brief: common practice, approximate).
    expect(screen.getByRole('alert')).toHaveTextContent(/too thick for the 8 mm slot opening/);
    expect(store.getState().design).toBe(before);
  });

  it('accepts a thinner sheet as one command', async () => {
    const { store } = renderWithStore(<LivePanelInspector />, framedPanelDesign());
    const user = userEvent.setup({ delay: null });
    const thickness = screen.getByRole('textbox', { name: 'Thickness' });
    await user.clear(thickness);
    await user.type(thickness, '6{Enter}');
    expect(store.getState().design.panels[0].thickness).toBe(6);
    expect(store.temporal.getState().pastStates).toHaveLength(1);
  });

  it('adds a round cut-out and refuses one that reaches past the edge', async () => {
    const { store } = renderWithStore(<LivePanelInspector />, framedPanelDesign());
    const user = userEvent.setup({ delay: null });
    await user.click(screen.getByRole('button', { name: 'Add cut-out' }));
    expect(store.getState().design.panels[0].cutouts).toEqual([expect.objectContaining({ u: 0, v: 0, diameter: 50 })]);
    const across = screen.getByRole('textbox', { name: 'Across' });
    await user.clear(across);
    await user.type(across, '250{Enter}');
    await user.click(screen.getByRole('button', { name: 'Add cut-out' }));
    expect(screen.getByRole('alert')).toHaveTextContent(/past the edge/);
    expect(store.getState().design.panels[0].cutouts).toHaveLength(1);
  });
});

describe('inspector content', () => {
  it('lists unjoined meetings and accepting one adds the joint with its connector', async () => {
    const design = framedPanelDesign();
    const { store } = renderWithStore(<InspectorContent />, { ...design, panels: [] });
    const proposals = screen.getAllByTestId('joint-proposal');
    expect(proposals.length).toBe(4);
    const user = userEvent.setup({ delay: null });
    await user.click(screen.getAllByRole('button', { name: 'Accept' })[0]);
    expect(store.getState().design.joints).toHaveLength(1);
    expect(screen.getAllByTestId('joint-proposal')).toHaveLength(3);
    await user.click(screen.getByRole('button', { name: 'Accept all' }));
    expect(store.getState().design.joints).toHaveLength(4);
    // Accept all is one history entry.
    act(() => store.getState().undo());
    expect(store.getState().design.joints).toHaveLength(1);
  });

  it('mirrors a selected profile as a copy, in one command, and selects the copy', async () => {
    const { store } = renderWithStore(<InspectorContent />, twoRailDesign());
    act(() => store.getState().select(['p2']));
    const user = userEvent.setup({ delay: null });
    await user.selectOptions(await screen.findByRole('combobox', { name: 'Across the plane normal to' }), 'y');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Through the centre of' }), 'selection');
    await user.click(screen.getByRole('button', { name: 'Mirror' }));
    expect(store.getState().design.profiles).toHaveLength(3);
    expect(store.getState().selection).toHaveLength(1);
    expect(store.getState().selection[0]).not.toBe('p2');
  });

  it('refuses a row of copies with a count that is not a whole number', async () => {
    const { store } = renderWithStore(<InspectorContent />, twoRailDesign());
    act(() => store.getState().select(['p1']));
    const user = userEvent.setup({ delay: null });
    const count = await screen.findByRole('textbox', { name: 'How many in all' });
    await user.clear(count);
    await user.type(count, '2.5');
    await user.click(screen.getByRole('button', { name: /in a row/ }));
    expect(screen.getByRole('alert')).toHaveTextContent(/whole number/);
    expect(store.getState().design.profiles).toHaveLength(2);
  });
});

function LiveJointInspector() {
  const joint = useEditorStore((state) => state.design.joints[0]);
  return joint ? <JointInspector joint={joint} /> : null;
}

describe('joint inspector', () => {
  it('changing the connector to a concealed one adds its access counterbore, undone in one step', async () => {
    const base = { ...framedPanelDesign(), panels: [] };
    const joined = applyOperation(base, { type: 'addJoint', payload: { joint: { kind: 'corner-bracket', members: [{ profileId: 'l', at: 'start' }, { profileId: 'b', at: 'span', along: 20 }] } } });
    const { store } = renderWithStore(<LiveJointInspector />, joined);
    expect(screen.getByRole('region', { name: 'Machining' })).toHaveTextContent('None');
    const user = userEvent.setup({ delay: null });
    await user.selectOptions(screen.getByRole('combobox', { name: 'Connector' }), 'concealed-connector');
    expect(store.getState().design.joints[0].kind).toBe('concealed-connector');
    expect(screen.getByRole('region', { name: 'Machining' })).toHaveTextContent(/Access counterbore on l/);
    expect(screen.getByRole('region', { name: 'This joint brings' })).toHaveTextContent(/× 1/);
    act(() => store.getState().undo());
    expect(store.getState().design).toBe(joined);
  });
});
