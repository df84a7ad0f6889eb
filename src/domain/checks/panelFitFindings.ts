/**
 * Panel fit: a captured panel's thickness against the slot opening (too thick: error; much
 * thinner: a gasket or retainer strip, with its length), its drawn opening against the frame,
 * its plane against the slots, and the corner notches connectors in the slot call for.
 */
import type { Finding } from '../analysis/types';
import { panelAxes } from '../geometry/panelGeometry';
import { sectionHalfExtentAlongAxis } from '../geometry/profileGeometry';
import { dominantAxis } from '../geometry/vectors';
import type { AnalysisContext, PanelInfo, ProfileInfo } from '../analysis/context';
import type { SectionAxes } from '../geometry/profileGeometry';
import { allPanelCornerNotches } from '../analysis/panelNotches';
import { sheetThicknessTolerance } from '../catalogue/materials';
import { capitalise, countOf, findingId, formatNumber, mm, panelName } from '../analysis/describe';
import { addGasketFix, setPanelThicknessFix } from './fixes';
import { MAX_FINDINGS_PER_CHECK, moreFindingsFinding } from './findingCap';
import type { CornerNotches } from '../geometry/cornerNotches';

const CHECK = 'panel-fit';
/** Thinner than this share of the slot opening rattles: needs a gasket or retainer strip. Common practice, no source. */
export const THIN_PANEL_RATIO = 0.6;
/** Temperature swing a panel sees after fitting, K (indoor use; common practice, no source). */
export const PANEL_TEMPERATURE_SWING_K = 30;
/** Thermal expansion of the aluminium frame, per K (6063-T6, 23.4 µm/(m·K); ASM / MatWeb, verified). */
const FRAME_EXPANSION = 23.4e-6;
/** Drawn opening and frame opening may differ by this much, mm. */
const OPENING_TOLERANCE_MM = 1;

function notchNote(info: PanelInfo, notch: CornerNotches): Finding {
  const { panel } = info;
  return {
    id: findingId(CHECK, 'corner-notch', [panel.id]),
    check: CHECK,
    severity: 'note',
    partIds: [panel.id, ...notch.jointIds],
    message: `${capitalise(panelName(panel))} needs a ${mm(notch.size)} square notch at ${countOf(notch.corners, 'corner')}, where connectors sit in the slot (${countOf(notch.jointIds.length, 'joint')}). Cut size ${formatNumber(info.sheetWidth)} × ${formatNumber(info.sheetHeight)} mm.`,
    data: { notchMm: notch.size, corners: notch.corners, sheetWidthMm: round(info.sheetWidth), sheetHeightMm: round(info.sheetHeight) },
  };
}

export function panelFitFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  const notches: { info: PanelInfo; notch: CornerNotches }[] = [];
  const opening = openingScratch();
  // Read from the context once for every panel.
  const notchesByPanel = allPanelCornerNotches(ctx);
  const clearance = ctx.design.settings.panelClearance;
  for (const info of ctx.panels) {
    const { panel } = info;
    if (!info.material) {
      out.push({
        id: findingId(CHECK, 'unknown-material', [panel.id]),
        check: CHECK,
        severity: 'error',
        partIds: [panel.id],
        message: `${capitalise(panelName(panel))} uses a material that is not in the catalogue. Pick another material.`,
      });
    }
    if (panel.mounting !== 'captured') continue;
    if (info.bounding.length !== 4) {
      out.push({
        id: findingId(CHECK, 'no-frame', [panel.id]),
        check: CHECK,
        severity: 'error',
        partIds: [panel.id],
        message: `${capitalise(panelName(panel))} is captured in slots but does not name the four profiles around it. Pick its frame or mount it on a face.`,
      });
      continue;
    }
    checkThickness(ctx, info, out);
    checkThermal(clearance, info, out);
    checkOpening(info, out, opening);
    const notch = notchesByPanel[info.index];
    if (notch.corners > 0) notches.push({ info, notch });
  }
  // The findings list shows the first MAX_FINDINGS_PER_CHECK of this check, errors and warnings
  // first, then notes by id: notes beyond that are only counted (one closing finding), so no
  // message is written for them (about 1,000 notch notes at 8,000 profiles).
  const room = Math.max(0, MAX_FINDINGS_PER_CHECK - out.length);
  if (notches.length > room) {
    // Note ids differ only in the panel id after a common prefix, so panel ids sort them: no id
    // string per note.
    const ids = notches.map(({ info }) => info.panel.id);
    const order = notches.map((_, k) => k).sort((a, b) => (ids[a] < ids[b] ? -1 : ids[a] > ids[b] ? 1 : a - b));
    const shown = order.slice(0, room).sort((a, b) => a - b);
    for (const k of shown) out.push(notchNote(notches[k].info, notches[k].notch));
    out.push(moreFindingsFinding(CHECK, 'note', notches.length - room));
  } else {
    for (const { info, notch } of notches) out.push(notchNote(info, notch));
  }
  return out;
}

/** The thickest sheet of the material that goes into the slot even at the top of its thickness tolerance, mm. */
export function thickestFittingSheet(info: PanelInfo, slotOpening: number): number | undefined {
  const material = info.material;
  if (!material) return undefined;
  return material.thicknesses.filter((t) => t + sheetThicknessTolerance(material, t) <= slotOpening).sort((a, b) => b - a)[0];
}

function checkThickness(ctx: AnalysisContext, info: PanelInfo, out: Finding[]): void {
  const { panel, slotOpening } = info;
  if (slotOpening === null) return;
  // Names, the fitting sheet and its fix are only worked out for a panel that gets a finding (in
  // functions of their own: closures here made a context and three functions per panel).
  if (panel.thickness > slotOpening) {
    const fits = thickestFittingSheet(info, slotOpening);
    const fix = fits !== undefined ? setPanelThicknessFix(panel.id, fits) : undefined;
    out.push({
      id: findingId(CHECK, 'too-thick', [panel.id]),
      check: CHECK,
      severity: 'error',
      partIds: [panel.id, ...info.bounding.map((b) => b.profile.id)],
      message: `${formatNumber(panel.thickness)} mm ${materialName(info)} is thicker than the ${formatNumber(slotOpening)} mm slot opening of the ${systemName(ctx, info)} profiles around ${panelName(panel)}; it will not go into the slot.${insteadText(fits)}`,
      ...(fix ? { fix } : {}),
      data: { thicknessMm: panel.thickness, slotOpeningMm: slotOpening },
    });
    return;
  }
  const tolerance = info.material ? sheetThicknessTolerance(info.material, panel.thickness) : 0;
  if (panel.thickness + tolerance > slotOpening) {
    const fits = thickestFittingSheet(info, slotOpening);
    const fix = fits !== undefined ? setPanelThicknessFix(panel.id, fits) : undefined;
    out.push({
      id: findingId(CHECK, 'no-clearance', [panel.id]),
      check: CHECK,
      severity: 'warning',
      partIds: [panel.id, ...info.bounding.map((b) => b.profile.id)],
      message: `${formatNumber(panel.thickness)} mm ${materialName(info)} may be up to ${formatNumber(panel.thickness + tolerance, 2)} mm thick (tolerance ±${formatNumber(tolerance, 2)} mm; ${info.material?.thicknessTolerance.source ?? 'no source'}), more than the ${formatNumber(slotOpening)} mm slot opening of the ${systemName(ctx, info)} profiles around ${panelName(panel)}: it may not go into the slot.${insteadText(fits)}`,
      ...(fix ? { fix } : {}),
      data: { thicknessMm: panel.thickness, toleranceMm: round(tolerance), slotOpeningMm: slotOpening },
    });
    return;
  }
  if (panel.thickness < THIN_PANEL_RATIO * slotOpening) {
    const gasketLength = Math.round(2 * (info.sheetWidth + info.sheetHeight));
    if (hasGasket(ctx, panel.id)) return;
    const fix = addGasketFix(ctx, info, gasketLength);
    out.push({
      id: findingId(CHECK, 'too-thin', [panel.id]),
      check: CHECK,
      severity: 'warning',
      partIds: [panel.id],
      message: `${formatNumber(panel.thickness)} mm ${materialName(info)} is much thinner than the ${formatNumber(slotOpening)} mm slot and will rattle: ${panelName(panel)} needs a gasket or retainer strip, ${formatNumber(gasketLength / 1000, 2)} m for its four edges.`,
      ...(fix ? { fix } : {}),
      data: { thicknessMm: panel.thickness, slotOpeningMm: slotOpening, gasketLengthMm: gasketLength },
    });
  }
}

function hasGasket(ctx: AnalysisContext, panelId: string): boolean {
  for (const a of ctx.design.accessories) if (a.panelId === panelId && a.kind === 'gasket') return true;
  return false;
}

function materialName(info: PanelInfo): string {
  return info.material?.name.toLowerCase() ?? info.panel.materialId;
}

function systemName(ctx: AnalysisContext, info: PanelInfo): string {
  return info.bounding[0].system?.name ?? ctx.design.systemId;
}

/** What to do instead, given the thickest sheet that fits (undefined: none does). */
function insteadText(fits: number | undefined): string {
  return fits !== undefined ? ` Use ${formatNumber(fits)} mm sheet, which fits even at the top of its tolerance, or mount the panel on a face.` : ' Mount it on a face instead.';
}

/**
 * Thermal growth of a captured sheet against the aluminium frame over PANEL_TEMPERATURE_SWING_K:
 * ΔL = |α_panel − α_frame|·L·ΔT, against the play left in the slots (the clearance plus the slot
 * depth beyond the engagement, both sides).
 */
function checkThermal(panelClearance: number, info: PanelInfo, out: Finding[]): void {
  const material = info.material;
  if (!material) return;
  let room = Infinity;
  let systems = 0;
  for (const b of info.bounding) {
    if (!b.system) continue;
    systems += 1;
    room = Math.min(room, b.system.slotDepth - b.system.slotEngagement);
  }
  if (systems === 0) return;
  const play = panelClearance + 2 * Math.max(0, room);
  const length = Math.max(info.sheetWidth, info.sheetHeight);
  const growth = Math.abs(material.thermalExpansion - FRAME_EXPANSION) * length * PANEL_TEMPERATURE_SWING_K;
  if (growth <= play) return;
  out.push({
    id: findingId(CHECK, 'thermal', [info.panel.id]),
    check: CHECK,
    severity: 'warning',
    partIds: [info.panel.id],
    message: `Panel ${info.panel.id} (${material.name.toLowerCase()}) grows about ${mm(growth)} more than the frame over a ${PANEL_TEMPERATURE_SWING_K} K temperature swing along its ${mm(length)} length, more than the ${mm(play)} of play in the slots: it can bow or crack. Leave more clearance or use a stiffer, lower-expansion sheet.`,
    data: { growthMm: round(growth), playMm: round(play) },
  });
}

/** Clear opening between the inner faces of the bounding profiles, and whether the panel is in their slot plane. */
export function frameOpening(info: PanelInfo): { width: number; height: number; offPlane: number } | null {
  const into = openingScratch();
  return frameOpeningInto(info, into) ? { width: into.opening[0], height: into.opening[1], offPlane: into.opening[2] } : null;
}

/**
 * Scratch for `frameOpeningInto`, shared by every panel of one check: the opening (width,
 * height, off-plane distance) and the dominant axis of the last two profile orientations seen.
 * Profiles of one analysis context with exactly the same direction and roll share one
 * `SectionAxes` object (the context's orientation cache compares the numbers exactly), so that
 * object keys the answer, and a frame's profiles need not have their own directions read.
 */
interface OpeningScratch {
  opening: Float64Array;
  axesA: SectionAxes | undefined;
  alongA: 0 | 1 | 2;
  axesB: SectionAxes | undefined;
  alongB: 0 | 1 | 2;
}

function openingScratch(): OpeningScratch {
  return { opening: new Float64Array(3), axesA: undefined, alongA: 0, axesB: undefined, alongB: 0 };
}

/** `dominantAxis` of the profile's direction, from the scratch when its orientation was seen last or before. */
function dominantAxisOf(b: ProfileInfo, s: OpeningScratch): 0 | 1 | 2 {
  if (b.axes === s.axesA) return s.alongA;
  if (b.axes === s.axesB) return s.alongB;
  const along = dominantAxis(b.profile.direction);
  s.axesB = s.axesA;
  s.alongB = s.alongA;
  s.axesA = b.axes;
  s.alongA = along;
  return along;
}

/** `frameOpening` written into `scratch.opening` (width, height, off-plane distance); false where it is null. */
function frameOpeningInto(info: PanelInfo, scratch: OpeningScratch): boolean {
  const { n, w, h } = panelAxes(info.panel.rect.normal);
  const c = info.panel.rect.center;
  // Low and high edge along the width (0) and height (1), in locals: no pair list per panel.
  let low0 = -Infinity;
  let low1 = -Infinity;
  let high0 = Infinity;
  let high1 = Infinity;
  let offPlane = 0;
  const bounding = info.bounding;
  for (let i = 0; i < bounding.length; i++) {
    const b = bounding[i];
    const along = dominantAxisOf(b, scratch);
    if (along === n) return false;
    // A profile running along the width axis bounds the height, and the other way round.
    const across = along === w ? h : w;
    const half = sectionHalfExtentAlongAxis(b.axes, b.width, b.height, across);
    const axisCoord = b.startPoint[across];
    if (along === w) {
      if (axisCoord >= c[across]) high1 = Math.min(high1, axisCoord - half);
      else low1 = Math.max(low1, axisCoord + half);
    } else if (axisCoord >= c[across]) high0 = Math.min(high0, axisCoord - half);
    else low0 = Math.max(low0, axisCoord + half);
    offPlane = Math.max(offPlane, Math.abs(b.startPoint[n] - c[n]));
  }
  if (!Number.isFinite(low0 + high0 + low1 + high1)) return false;
  const into = scratch.opening;
  into[0] = high0 - low0;
  into[1] = high1 - low1;
  into[2] = offPlane;
  return true;
}

/** `opening`: scratch for the frame opening, shared by every panel of one check. */
function checkOpening(info: PanelInfo, out: Finding[], scratch: OpeningScratch): void {
  const { panel } = info;
  const opening = scratch.opening;
  if (!frameOpeningInto(info, scratch)) {
    out.push({
      id: findingId(CHECK, 'frame-not-rectangle', [panel.id]),
      check: CHECK,
      severity: 'error',
      partIds: panelAndFrameIds(info),
      message: `The four profiles named around ${panelName(panel)} do not form a rectangle in the panel's plane.`,
    });
    return;
  }
  const width = opening[0];
  const height = opening[1];
  const offPlane = opening[2];
  if (info.slotOpening !== null && offPlane > info.slotOpening / 2) {
    out.push({
      id: findingId(CHECK, 'off-slot-plane', [panel.id]),
      check: CHECK,
      severity: 'error',
      partIds: panelAndFrameIds(info),
      message: `${capitalise(panelName(panel))} is ${mm(offPlane)} out of line with the slots of its frame; a captured panel sits in the slot centre.`,
      data: { offsetMm: round(offPlane) },
    });
  }
  const dw = Math.abs(width - panel.rect.width);
  const dh = Math.abs(height - panel.rect.height);
  if (dw > OPENING_TOLERANCE_MM || dh > OPENING_TOLERANCE_MM) {
    out.push({
      id: findingId(CHECK, 'opening-mismatch', [panel.id]),
      check: CHECK,
      severity: 'warning',
      partIds: panelAndFrameIds(info),
      message: `${capitalise(panelName(panel))} is drawn ${formatNumber(panel.rect.width)} × ${formatNumber(panel.rect.height)} mm, but its frame's clear opening is ${formatNumber(width)} × ${formatNumber(height)} mm. Resize the panel to the opening.`,
      data: { openingWidthMm: round(width), openingHeightMm: round(height) },
    });
  }
}

/** The panel's id, then its frame profiles' (only for a panel that gets a finding). */
function panelAndFrameIds(info: PanelInfo): string[] {
  return [info.panel.id, ...info.bounding.map((b) => b.profile.id)];
}

function round(v: number): number {
  return Math.round(v * 100) / 100;
}
