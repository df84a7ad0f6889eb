/**
 * analyzeDesign: every check and output for a design, as plain JSON-serialisable data.
 * Per-profile geometry, catalogue maps and the spatial index are built once and shared.
 * Units: mm, kg, N, MPa; prices in the demo price list's currency.
 */
import type { DesignAnalysis, Finding, Severity } from './types';
import { defaultCatalogue } from '../catalogue';
import type { Catalogue } from '../catalogue/types';
import { indexCatalogue } from './catalogueIndex';
import { buildAnalysisContext, type AnalysisContext } from './context';
import { capFindings } from '../checks/findingCap';
import { frameGroupFindings } from '../checks/frameGroupFindings';
import { interferenceFindings } from '../checks/interferenceFindings';
import { jointFindings } from '../checks/jointFindings';
import { panelFitFindings } from '../checks/panelFitFindings';
import { sequenceFindings } from '../assembly/sequenceFindings';
import { structureAnalysis } from '../checks/structureFindings';
import type { DesignDocument } from '../design/schema';
import { billOfMaterials } from '../outputs/bom';
import { costSummary } from '../outputs/cost';
import { cutList } from '../outputs/cutList';
import { hardwareSummary } from '../outputs/hardware';
import { massSummary } from '../outputs/mass';
import { panelCutItems, panelSheets } from '../outputs/panelSheets';
import { stockPlans } from '../outputs/stockPlans';
import { toolList } from '../outputs/tools';

export type { DesignAnalysis, Finding } from './types';

export interface AnalyzeOptions {
  /** Record how long each stage took in `timingsMs` (default true). */
  timings?: boolean;
}

const SEVERITY_ORDER: Record<Severity, number> = { error: 0, warning: 1, note: 2 };

const now = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now());

/** Builds the shared analysis context (geometry, maps, spatial index) for a design. */
export function createAnalysisContext(design: DesignDocument, catalogue: Catalogue = defaultCatalogue): AnalysisContext {
  return buildAnalysisContext(design, indexCatalogue(catalogue));
}

export function analyzeDesign(design: DesignDocument, catalogue: Catalogue = defaultCatalogue, options: AnalyzeOptions = {}): DesignAnalysis {
  const timings: Record<string, number> = {};
  let mark = now();
  const lap = (name: string) => {
    const t = now();
    timings[name] = Math.round((t - mark) * 1000) / 1000;
    mark = t;
  };
  const ctx = createAnalysisContext(design, catalogue);
  lap('context');

  // Appended one by one: spreading a huge list into push() overflows the call stack.
  const findings: Finding[] = [];
  const append = (list: readonly Finding[]) => {
    for (const finding of list) findings.push(finding);
  };
  append(jointFindings(ctx));
  lap('joints');
  append(panelFitFindings(ctx));
  lap('panelFit');
  append(interferenceFindings(ctx));
  lap('interference');
  append(sequenceFindings(ctx));
  lap('sequence');
  append(frameGroupFindings(ctx));

  const hardware = hardwareSummary(ctx);
  const sheets = panelSheets(ctx);
  const bom = billOfMaterials(ctx, hardware, sheets);
  lap('bom');
  const cuts = cutList(ctx);
  lap('cutList');
  const plans = stockPlans(ctx);
  lap('stockPlan');
  const tools = toolList(ctx, hardware);
  const mass = massSummary(ctx, hardware, sheets);
  const cost = costSummary(ctx, bom, sheets);
  lap('toolsMassCost');
  const structure = structureAnalysis(ctx, { total: mass.total, centreOfMass: mass.centreOfMass });
  append(structure.findings);
  lap('structure');

  findings.sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity] || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  // Counts cover every finding, listed or not; the list is capped per check.
  const counts = { error: 0, warning: 0, note: 0 };
  for (const f of findings) {
    const omitted = f.id === `${f.check}:more` ? Number(f.data?.omitted ?? 0) : 1;
    counts[f.severity] += omitted;
  }
  const capped = capFindings(findings);

  return {
    findings: capped.findings,
    ...(capped.omitted > 0 ? { omittedFindings: capped.omitted } : {}),
    counts,
    bom,
    cutList: cuts.items,
    cutGroups: cuts.groups,
    stockPlans: plans,
    panelCuts: panelCutItems(sheets),
    tools,
    mass,
    cost,
    structure: structure.results,
    stability: structure.stability,
    ...(options.timings === false ? {} : { timingsMs: timings }),
  };
}
