import { StatsInputError } from './errors';
import { codeFactor } from './trial-layout';
import type { ModelMatrixTerm } from './model-matrix';

/** Layouts the regression models (time ratios, proportional odds, counts, repeated measures) accept. */
export type ModelDesign = 'crd' | 'rcbd' | 'multisite-rcbd';
export const MODEL_DESIGNS: readonly ModelDesign[] = ['crd', 'rcbd', 'multisite-rcbd'];

/** The labels of one plot's observation. */
export interface LabelledPlot {
  readonly treatment?: string;
  readonly block?: string;
  readonly site?: string;
}

/** A named term of the model, with how it is shown ('site', 'block' or 'block:site', 'treatment'). */
export interface LayoutTerm {
  readonly name: string;
  readonly term: ModelMatrixTerm;
}

export interface ModelLayout {
  readonly design: ModelDesign;
  /** Treatments in order of first appearance. */
  readonly treatments: readonly string[];
  /** The reference treatment of the contrasts: the control when given, else the first treatment. */
  readonly reference: string;
  /** Treatment code of each row (index into `treatments`). */
  readonly treatmentCodes: Int32Array;
  /** Design terms before treatment: [] (crd), [block] (rcbd), [site, block:site] (multisite). */
  readonly blockingTerms: readonly LayoutTerm[];
  readonly treatmentTerm: LayoutTerm;
  /** Stratum of each row for stratified tests: the block (rcbd) or site / block (multisite); undefined for crd. */
  readonly strata?: readonly string[];
  /** Site of each row when the design has sites. */
  readonly sites?: readonly string[];
  /** Sites in order of first appearance. */
  readonly siteLevels: readonly string[];
}

/** Rows of the reference grid: every block (with its site) × every treatment, each block weighted equally within its site and the sites equally. */
export interface LayoutGrid {
  readonly rowCount: number;
  /** The layout's terms with codes for the grid rows (same levels and references, so the same model-matrix columns). */
  readonly terms: readonly LayoutTerm[];
  /** Treatment of each grid row (index into layout.treatments). */
  readonly treatment: Int32Array;
  /** Weight of each row within its treatment (they sum to 1 per treatment). */
  readonly weight: Float64Array;
}

function factorTerm(name: string, shownAs: string, levels: readonly string[], codes: Int32Array, reference?: readonly number[]): LayoutTerm {
  return { name: shownAs, term: { kind: 'factor', name, levels, codes, ...(reference ? { reference } : {}) } };
}

/**
 * The reference grid of a layout, over which least-squares means and model-based treatment summaries are
 * averaged: blocks equally within each site, then sites equally (emmeans' `nesting = "block %in% site"`).
 * Reference: Searle, Speed & Milliken (1980), Population marginal means in the linear model, Am. Stat. 34:216.
 * @throws never.
 * @example layoutGrid(modelLayout('rcbd', plots)).rowCount; // blocks × treatments
 */
export function layoutGrid(layout: ModelLayout): LayoutGrid {
  const treatments = layout.treatments.length;
  const treatmentTerm = layout.treatmentTerm.term as Extract<ModelMatrixTerm, { kind: 'factor' }>;
  const modelCode = layout.treatments.map((t) => treatmentTerm.levels.indexOf(t));
  const blockTerm = layout.blockingTerms.find((t) => t.name !== 'site')?.term as Extract<ModelMatrixTerm, { kind: 'factor' }> | undefined;
  const blocks = blockTerm ? blockTerm.levels.length : 1;
  const siteTerm = layout.blockingTerms.find((t) => t.name === 'site')?.term as Extract<ModelMatrixTerm, { kind: 'factor' }> | undefined;
  const siteOfBlock = Int32Array.from({ length: blocks }, (_, b) => (siteTerm && blockTerm ? siteTerm.levels.indexOf(blockTerm.levels[b]!.slice(0, blockTerm.levels[b]!.lastIndexOf(' / '))) : 0));
  const sites = siteTerm ? siteTerm.levels.length : 1;
  const blocksPerSite = new Float64Array(sites);
  siteOfBlock.forEach((site) => blocksPerSite[site]!++);
  const rowCount = blocks * treatments;
  const treatment = new Int32Array(rowCount);
  const weight = new Float64Array(rowCount);
  const blockCodes = new Int32Array(rowCount);
  const siteCodes = new Int32Array(rowCount);
  const treatmentCodes = new Int32Array(rowCount);
  for (let b = 0; b < blocks; b++) {
    for (let t = 0; t < treatments; t++) {
      const row = b * treatments + t;
      treatment[row] = t;
      weight[row] = 1 / (sites * blocksPerSite[siteOfBlock[b]!]!);
      blockCodes[row] = b;
      siteCodes[row] = siteOfBlock[b]!;
      treatmentCodes[row] = modelCode[t]!;
    }
  }
  const withCodes = (term: LayoutTerm, codes: Int32Array): LayoutTerm => ({ name: term.name, term: { ...(term.term as Extract<ModelMatrixTerm, { kind: 'factor' }>), codes } });
  const terms = [
    ...layout.blockingTerms.map((term) => withCodes(term, term.name === 'site' ? siteCodes : blockCodes)),
    withCodes(layout.treatmentTerm, treatmentCodes),
  ];
  return Object.freeze({ rowCount, terms, treatment, weight });
}

function label(value: string | undefined, what: string, design: string, row: number): string {
  if (typeof value === 'string' && value.trim() !== '') return value;
  throw new StatsInputError(`missing ${what}`, `row ${row + 1} of the observations has no ${what}, which the ${design} design needs`);
}

/**
 * The terms of a trial design for the regression models, coded as R does with treatment contrasts:
 * `~ treatment` (crd), `~ block + treatment` (rcbd), `~ site + site:block + treatment` (multisite-rcbd,
 * blocks nested in sites: one reference block per site). The control is the treatment reference, so each
 * treatment coefficient is its contrast with the control.
 * Reference: Chambers & Hastie (1992), Statistical Models in S, §2.3.
 * @throws StatsInputError for an unknown design, a missing label, fewer than two treatments or an unknown control.
 * @example modelLayout('rcbd', [{ treatment: 'C', block: '1' }, { treatment: 'G', block: '1' }]).reference; // 'C'
 */
export function modelLayout(design: string, plots: readonly LabelledPlot[], control?: string): ModelLayout {
  if (!(MODEL_DESIGNS as readonly string[]).includes(design)) {
    throw new StatsInputError('unknown design', `design must be one of ${MODEL_DESIGNS.join(', ')}, got ${design}`);
  }
  const d = design as ModelDesign;
  const treatmentLabels = plots.map((p, i) => label(p.treatment, 'treatment', d, i));
  const treatments = [...new Set(treatmentLabels)];
  if (treatments.length < 2) throw new StatsInputError('too few treatments', `an analysis needs at least two treatments, found ${treatments.length}`);
  if (control !== undefined && !treatments.includes(control)) throw new StatsInputError('unknown control', `control ${control} is not among the treatments (${treatments.join(', ')})`);
  const reference = control ?? treatments[0]!;
  const ordered = [reference, ...treatments.filter((t) => t !== reference)];
  const levelIndex = new Map(ordered.map((t, i) => [t, i]));
  const modelCodes = Int32Array.from(treatmentLabels, (t) => levelIndex.get(t)!);
  const firstAppearance = new Map(treatments.map((t, i) => [t, i]));
  const treatmentTerm = factorTerm('treatment', 'treatment', ordered, modelCodes);
  const base = {
    design: d,
    treatments,
    reference,
    treatmentCodes: Int32Array.from(treatmentLabels, (t) => firstAppearance.get(t)!),
    treatmentTerm,
  };
  if (d === 'crd') return Object.freeze({ ...base, blockingTerms: [], siteLevels: [] });
  const blocks = plots.map((p, i) => label(p.block, 'block', d, i));
  if (d === 'rcbd') {
    const block = codeFactor('block', blocks);
    return Object.freeze({
      ...base,
      blockingTerms: [factorTerm('block', 'block', block.levels, block.codes)],
      strata: blocks,
      siteLevels: [],
    });
  }
  const sites = plots.map((p, i) => label(p.site, 'site', d, i));
  const site = codeFactor('site', sites);
  const nested = codeFactor('block:site', sites.map((s, i) => `${s} / ${blocks[i]}`));
  const siteOfBlock = nested.levels.map((levelLabel) => levelLabel.slice(0, levelLabel.lastIndexOf(' / ')));
  const blockReference = site.levels.map((s) => siteOfBlock.indexOf(s));
  return Object.freeze({
    ...base,
    blockingTerms: [
      factorTerm('site', 'site', site.levels, site.codes),
      factorTerm('block', 'block:site', nested.levels, nested.codes, blockReference),
    ],
    strata: nested.levels.length > 0 ? Array.from(nested.codes, (c) => nested.levels[c]!) : undefined,
    sites,
    siteLevels: site.levels,
  });
}
