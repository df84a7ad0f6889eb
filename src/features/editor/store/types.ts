import type { StoreApi } from 'zustand';
import type { TemporalState } from 'zundo';
import type { DesignAnalysis } from '@/domain/analysis/types';
import type { DesignDocument } from '@/domain/design/schema';
import type { LengthUnit } from '@/domain/units';
import type { EditorCommand } from '../commands/EditorCommand';

export type EditorTool = 'select' | 'draw-profile' | 'fill-opening' | 'measure';
export type EditorView = 'front' | 'top' | 'side' | 'iso';
export type SelectionMode = 'replace' | 'add' | 'toggle';
export type AnalysisStatus = 'idle' | 'running' | 'ready' | 'error';
export type DisplayUnits = LengthUnit;

export interface LoadMeta {
  designId: number | null;
  revision: number;
  savedAt?: string;
  savedBy?: string;
}

export interface SavedMeta {
  revision: number;
  at: string;
  by: string;
  /** The document that was sent; defaults to the current one. Edits made while the save was in flight stay dirty. */
  design?: DesignDocument;
}

/** A command the store refused (its apply threw); `nonce` changes on every refusal so a toast can react. */
export interface CommandRefusal {
  label: string;
  message: string;
  nonce: number;
}

export interface DesignSlice {
  designId: number | null;
  baseRevision: number;
  design: DesignDocument;
  dirty: boolean;
  lastSaved: { at: string; by: string; revision: number } | null;
  /** Label of the command that produced the current design (the undo button's tooltip). Tracked with `design`. */
  historyLabel: string | undefined;
  /** True between beginGesture and endGesture/cancelGesture. */
  gestureActive: boolean;
  lastRefusal: CommandRefusal | null;
  /** Applies the command as one history entry. Returns false (design unchanged) when the command refuses. */
  execute(command: EditorCommand): boolean;
  beginGesture(): void;
  previewDesign(design: DesignDocument): void;
  endGesture(label: string): void;
  /** Abandons a gesture: the design returns to where the gesture began, with no history entry. */
  cancelGesture(): void;
  undo(): void;
  redo(): void;
  loadDesign(design: DesignDocument, meta: LoadMeta): void;
  markSaved(meta: SavedMeta): void;
}

export interface SelectionSlice {
  selection: string[];
  hoveredId: string | null;
  /** The opening the fill-opening tool picked (an id from detectOpenings), or null. */
  pickedOpeningId: string | null;
  select(ids: string[], mode?: SelectionMode): void;
  clearSelection(): void;
  setHovered(id: string | null): void;
  pickOpening(openingId: string | null): void;
}

export interface ViewSlice {
  tool: EditorTool;
  drawSystemVariantId: string;
  units: DisplayUnits;
  frameRequest: { ids: string[] | 'all'; nonce: number } | null;
  viewRequest: { view: EditorView; nonce: number } | null;
  setTool(tool: EditorTool): void;
  setDrawVariant(variantId: string): void;
  requestFrame(ids: string[] | 'all'): void;
  requestView(view: EditorView): void;
  setUnits(units: DisplayUnits): void;
}

export interface AnalysisSlice {
  analysis: DesignAnalysis | null;
  analysisStatus: AnalysisStatus;
  /** The analysis of exactly this design object (so panels can tell whether it is current). */
  analysedDesign: DesignDocument | null;
  setAnalysisRunning(): void;
  setAnalysisResult(design: DesignDocument, analysis: DesignAnalysis): void;
  setAnalysisFailed(): void;
}

export type EditorState = DesignSlice & SelectionSlice & ViewSlice & AnalysisSlice;

/** What the history records: the design and the label of the command that made it. */
export interface HistorySnapshot {
  design: DesignDocument;
  historyLabel: string | undefined;
}

export type EditorStoreApi = StoreApi<EditorState> & { temporal: StoreApi<TemporalState<HistorySnapshot>> };

/** Internal setter/getter pair each slice receives. */
export type SliceSet = StoreApi<EditorState>['setState'];
export type SliceGet = () => EditorState;
