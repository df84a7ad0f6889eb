/** Instance colours (multiplied onto the material): selection, hover and finding tints. */
import * as THREE from 'three';
import type { DesignAnalysis, Severity } from '@/domain/analysis/types';

export const HIGHLIGHT = {
  plain: new THREE.Color('#ffffff'),
  // Hover brightens without a hue, so wood, acrylic and aluminium keep their colour (values above 1
  // are allowed in the float instance colours).
  hovered: new THREE.Color(1.22, 1.22, 1.22),
  selected: new THREE.Color('#5fd8cc'),
  error: new THREE.Color('#ff9a90'),
  warning: new THREE.Color('#ffd98a'),
} as const;

/** Badge colours by severity: the tokens' severity colours (look.md), readable on the model. */
export const SEVERITY_COLOR: Record<Severity, THREE.Color> = {
  error: new THREE.Color('#d0342c'),
  warning: new THREE.Color('#d99a06'),
  note: new THREE.Color('#3f7fce'),
};

const RANK: Record<Severity, number> = { error: 3, warning: 2, note: 1 };

/** The most severe finding for each part it names. */
export function worstSeverityByPart(analysis: DesignAnalysis | null): Map<string, Severity> {
  const worst = new Map<string, Severity>();
  if (!analysis) return worst;
  for (const finding of analysis.findings) {
    for (const id of finding.partIds) {
      const current = worst.get(id);
      if (!current || RANK[finding.severity] > RANK[current]) worst.set(id, finding.severity);
    }
  }
  return worst;
}

export function colourFor(partId: string, selected: ReadonlySet<string>, hoveredId: string | null, severity: Map<string, Severity>): THREE.Color {
  if (selected.has(partId)) return HIGHLIGHT.selected;
  if (partId === hoveredId) return HIGHLIGHT.hovered;
  const s = severity.get(partId);
  if (s === 'error') return HIGHLIGHT.error;
  if (s === 'warning') return HIGHLIGHT.warning;
  return HIGHLIGHT.plain;
}
