// The Protocol, Sites and Plot plan part of the API (issue: protocol, sites, randomized plot plans).
import type { TrialDesign, TrialRole, TrialStatus } from './index';

export const MEASURE_KINDS = ['continuous', 'count', 'score', 'time-with-cutoff'] as const;
export type MeasureKind = (typeof MEASURE_KINDS)[number];

export const RATE_UNIT_IDS = ['lb/100ft2', 'lb/1000ft2', 'lb/acre', 'g/m2', 'kg/m2', 'kg/ha', 't/ha', 'ton/acre', 'in', 'cm', 'yd3/1000ft2'] as const;
export type RateUnitId = (typeof RATE_UNIT_IDS)[number];

export const RATE_BASES = ['area', 'concentration'] as const;
export type RateBasis = (typeof RATE_BASES)[number];

/** The unit a factor's levels are applied to: the plot, or a stratum of a split plot. */
export const APPLIED_UNITS = ['plot', 'whole plot', 'sub plot', 'sub-sub plot'] as const;
export type AppliedUnit = (typeof APPLIED_UNITS)[number];

/** The stated rate of what is applied and its material: a treatment's, or a factor level's. */
export interface MaterialRate {
  /** null for an untreated control (or level) without an applied material. */
  rateValue: number | null;
  rateUnit: RateUnitId | null;
  rateBasis: RateBasis;
  /** Needed when rateBasis is 'concentration'. */
  incorporationDepthCm: number | null;
  product: string | null;
  /** Share of active material in the product, (0, 1]; null = the rate is for the product as sold. */
  purity: number | null;
  /** 'as-is' (default) or 'dry' basis of the rate. */
  moistureBasis: 'as-is' | 'dry';
  /** Water share of the as-is product for a dry-basis rate, [0, 1). */
  moistureFraction: number | null;
  materialKind: 'gypsum' | 'other';
}

/** What a level of a factor is: its own code, name and (when something is applied) its rate and material. */
export interface FactorLevel extends MaterialRate {
  id: number;
  /** 1 to 6 letters or digits, unique within the factor; treatment codes join the level codes. */
  code: string;
  name: string;
  description: string | null;
}

export interface Factor {
  id: number;
  /** Bumped by every save; send it back with each edit (PATCH): another one answers 409 with the current record. */
  version: number;
  /** 1 to 4 in the order given; a split plot's whole-plot factor is 1, its sub-plot factor 2, its sub-sub-plot factor 3. */
  position: 1 | 2 | 3 | 4;
  name: string;
  /** Where the levels go on: every plot, or a split plot's whole plots, sub plots or sub-sub plots. */
  appliedTo: AppliedUnit;
  levels: FactorLevel[];
}

export interface Treatment extends MaterialRate {
  id: number;
  /** Bumped by every save; send it back with each edit (PATCH): another one answers 409 with the current record. */
  version: number;
  code: string;
  name: string;
  description: string | null;
  isControl: boolean;
  /** Factorial and split-plot trials: the level of each factor, in the factors' order. */
  factorLevelIds: number[];
  position: number;
}

export type TreatmentInput = Omit<Treatment, 'id' | 'version' | 'factorLevelIds' | 'position'> & { position?: number };

export interface Measure {
  id: number;
  /** Bumped by every save; send it back with each edit (PATCH): another one answers 409 with the current record. */
  version: number;
  code: string;
  name: string;
  /** An id from @friable/field's MEASURE_UNITS. */
  unit: string;
  kind: MeasureKind;
  /** Score scale (kind 'score'). */
  scaleMin: number | null;
  scaleMax: number | null;
  /** Cut-off in the measure's unit (kind 'time-with-cutoff'). */
  cutoff: number | null;
  /** Outside the plausible range: a warning. Outside the hard limits: an error. */
  plausibleMin: number | null;
  plausibleMax: number | null;
  hardMin: number | null;
  hardMax: number | null;
  decimals: number;
  higherIsBetter: boolean;
  position: number;
}

export type MeasureInput = Omit<Measure, 'id' | 'version' | 'position'> & { position?: number };

export interface AssessmentRound {
  id: number;
  /** Bumped by every save; send it back with each edit (PATCH): another one answers 409 with the current record. */
  version: number;
  label: string;
  dayOffset: number;
  /** startDate + dayOffset; null while the trial has no start date. */
  dueDate: string | null;
  measureIds: number[];
}

export type RoundInput = Omit<AssessmentRound, 'id' | 'version' | 'dueDate'>;

export interface PlotGeometryInput {
  shape: 'rectangle' | 'round';
  lengthM: number | null;
  widthM: number | null;
  /** Inside diameter at the soil surface, for round plots or containers. */
  diameterCm: number | null;
  containerDepthCm: number | null;
  soilVolumeL: number | null;
}

export interface Site extends PlotGeometryInput {
  id: number;
  /** Bumped by every save; send it back with each edit (PATCH): another one answers 409 with the current record. */
  version: number;
  name: string;
  location: string | null;
  soilDescription: string | null;
  /** Computed from the geometry. */
  areaM2: number;
  blocks: number;
  /** Two or three capital letters starting every plot label at this site, unique in the trial. */
  labelPrefix: string;
  leadUserId: number | null;
  leadName: string | null;
  randomizedAt: string | null;
  /** The seed text used for the current layout. */
  randomizationSeed: string | null;
  /** Plots at the site, 0 until randomized. */
  plotCount: number;
  hasObservations: boolean;
  /** Guardrail sentences: fewer than 4 blocks, error df below 12 in any stratum, one treatment. */
  warnings: string[];
  /** The error strata of the design at this site: each error line, its df and the terms tested against it. */
  strata: ErrorStratum[];
}

/** One error line of the design's ANOVA at a site (a split plot has a whole-plot and a sub-plot error). */
export interface ErrorStratum {
  unit: AppliedUnit;
  /** 'Error', 'Whole-plot error', 'Sub-plot error' or 'Sub-sub-plot error'. */
  name: string;
  errorDf: number;
  /** How the df are counted, in words: '(2 blocks − 1) × (2 levels of Amendment − 1)'. */
  arithmetic: string;
  /** Terms tested against it: factor names joined by ':' (as the analysis names them), or 'treatment'. */
  terms: string[];
  /** The F the first term must exceed at p = 0.05; null with no error df. */
  criticalF: number | null;
}

export type SiteInput = Omit<Site, 'id' | 'version' | 'areaM2' | 'leadName' | 'randomizedAt' | 'randomizationSeed' | 'plotCount' | 'hasObservations' | 'warnings' | 'strata'>;

export interface Plot {
  id: number;
  label: string;
  siteId: number;
  siteName: string;
  block: number;
  position: number;
  treatmentId: number;
  treatmentCode: string;
  /** Split designs: the whole plot within its block, from 1 (null otherwise). */
  wholePlot: number | null;
  /** Split designs: the sub plot within its whole plot, from 1 (null otherwise). */
  subPlot: number | null;
  /** Split-split plot: the sub-sub plot within its sub plot, from 1 (null otherwise). */
  subSubPlot: number | null;
  /** Split designs: the label of the whole plot the plot lies in, e.g. `HL-B2-W3` (null otherwise). */
  wholePlotLabel: string | null;
}

export interface ActivationCheck {
  ready: boolean;
  /** Each failed check in words, e.g. "Site Millbrook is not randomized yet." */
  problems: string[];
  /** What does not stop the trial but should be read before it starts (the design's guardrails per site), in words. */
  warnings: string[];
}

/** GET /api/trials/:trialId: the whole protocol. */
export interface TrialDetail {
  id: number;
  /** Bumped by every save; send it back with each edit (PATCH): another one answers 409 with the current record. */
  version: number;
  code: string;
  title: string;
  question: string | null;
  design: TrialDesign;
  status: TrialStatus;
  startDate: string | null;
  seed: string;
  safetyNotes: string | null;
  noControlReason: string | null;
  ownerId: number | null;
  myRoles: TrialRole[];
  /** Sites a collaborator caller is assigned to. */
  mySiteIds: number[];
  updatedAt: string;
  factors: Factor[];
  treatments: Treatment[];
  measures: Measure[];
  rounds: AssessmentRound[];
  sites: Site[];
  activation: ActivationCheck;
}

export interface TrialCreateInput {
  code: string;
  title: string;
  design?: TrialDesign;
  question?: string | null;
  startDate?: string | null;
  seed?: string;
  safetyNotes?: string | null;
}

export type TrialUpdateInput = Partial<Omit<TrialCreateInput, 'code'>> & {
  noControlReason?: string | null;
  /** 'active' only when every activation check passes (422 lists the problems). */
  status?: TrialStatus;
  /** The version the editor saw. */
  version: number;
};

/** A level as PUT …/factors takes it: code and name, and optionally its rate and material. */
export type FactorLevelInput = Pick<FactorLevel, 'code' | 'name'> & Partial<Omit<FactorLevel, 'id' | 'code' | 'name'>>;

/**
 * PUT /api/trials/:trialId/factors: 2 to 4 factors for a factorial, exactly 2 for a split plot (the whole-plot
 * factor first) and 3 for a split-split plot. The treatments become every combination of the levels. When the
 * factors and their level codes stay as they are, names and rates change in place and the layouts stay.
 */
export interface FactorsInput {
  /** `version`: the version of the factor stored at the same place, as GET answered it (none for a factor added at the end). */
  factors: Array<{ name: string; version?: number; levels: FactorLevelInput[] }>;
}

/** 409 answer of an edit made from a stale version: nothing was written; `current` is the record as stored now. */
export interface VersionConflict<T> {
  statusCode: 409;
  error: string;
  message: string;
  current: T;
}

/** GET /api/trials/:trialId/amounts: how much of each treatment's material goes on one plot at each site. */
export interface PlotAmount {
  siteId: number;
  treatmentId: number;
  treatmentCode: string;
  plots: number;
  perPlot: DoseAnswer | null;
  /** All the site's plots of this treatment, with the margin. */
  siteTotal: { grams: number | null; litres: number | null } | null;
}

/**
 * GET /api/trials/:trialId/level-amounts (factorial and split-plot trials): how much of each factor level's material
 * goes on one unit it is applied to (a whole plot for a split plot's whole-plot factor), and on all of them at a site.
 */
export interface LevelAmount {
  siteId: number;
  factorId: number;
  factorName: string;
  levelId: number;
  levelCode: string;
  levelName: string;
  appliedTo: AppliedUnit;
  /** Measured plots one unit covers (sub plots side by side in a whole plot); 1 for a plot. */
  plotsPerUnit: number;
  /** Surface of one unit: the site's plot area × plotsPerUnit. */
  unitAreaM2: number;
  /** Units of this level at the site (planned from the blocks before randomizing). */
  units: number;
  perUnit: DoseAnswer | null;
  /** All the site's units of this level, with the margin. */
  siteTotal: { grams: number | null; litres: number | null } | null;
  /** Why no amount could be worked out (a rate the site's geometry cannot take). */
  problem: string | null;
}

/** POST /api/rates/dose */
export interface DoseRequest {
  rate: number;
  unit: RateUnitId;
  basis: RateBasis;
  areaM2?: number;
  diameterCm?: number;
  lengthM?: number;
  widthM?: number;
  depthCm?: number;
  soilVolumeL?: number;
  purity?: number;
  moistureFraction?: number;
  bulkDensityKgPerL?: number;
  materialKind?: 'gypsum' | 'other';
  plots?: number;
  marginPercent?: number;
}

export interface DoseAnswer {
  grams: number | null;
  kilograms: number | null;
  ounces: number | null;
  pounds: number | null;
  litres: number | null;
  gallons: number | null;
  ratePerM2: { value: number; unit: 'g/m2' | 'L/m2' };
  areaM2: number;
  basis: RateBasis;
  warnings: string[];
  /** When `plots` was given: the amount for all of them with the margin. */
  total?: { grams: number | null; kilograms: number | null; pounds: number | null; litres: number | null; gallons: number | null };
}

export interface ActivityEntry {
  id: number;
  at: string;
  userId: number | null;
  userName: string | null;
  /** e.g. 'trial.created', 'treatment.updated', 'site.randomized', 'invitation.sent'. */
  kind: string;
  siteId: number | null;
  summary: string;
  details: Record<string, unknown>;
}

/** One site a layout-clearing change touches: its plots and the values recorded on them. */
export interface LayoutImpactSite {
  siteId: number;
  siteName: string;
  plots: number;
  values: number;
}

/** GET /trials/:id/layout-impact — what a change that clears layouts would lose, before it is made. */
export interface LayoutImpact {
  /** The sites with a layout (randomized), in the trial's order. */
  sites: LayoutImpactSite[];
  /** Sites whose layout would be cleared. */
  layouts: number;
  plots: number;
  values: number;
  /** "Clears the layouts of 3 sites, 60 plots: …", or "Clears no layout: …". */
  summary: string;
  /** When values exist the change is refused, and this says why; null otherwise. */
  refusal: string | null;
}

/** One site holding data that removing a measure or a round would archive. */
export interface RemovalImpactSite {
  siteId: number;
  siteName: string;
  /** Values recorded (censored ones and missing ones with their reason included). */
  values: number;
  censored: number;
  missing: number;
  /** Values that carry a note. */
  notes: number;
  /** Plot photos of the round (always 0 for a measure: photos belong to a plot and round). */
  photos: number;
}

/**
 * GET /trials/:id/measures/:measureId/removal-impact and /trials/:id/rounds/:roundId/removal-impact — what removing
 * it would take out of the Ledger, Findings and exports, asked before the removal. The rows are archived, not erased.
 */
export interface RemovalImpact {
  /** "measure DT (Drain time)", "round Week 2". */
  item: string;
  /** The sites holding its data, in the trial's order. */
  sites: RemovalImpactSite[];
  values: number;
  censored: number;
  missing: number;
  notes: number;
  photos: number;
  /** "Removes 240 recorded values and 12 notes of Drain time across 3 sites (…). They are archived: …". */
  summary: string;
  /** True when data would be archived: the removal then needs the trial's code typed (sent as `confirm`). */
  confirmationNeeded: boolean;
  /** Why the removal would be refused whatever is typed (the only measure of a round), or null. */
  refusal: string | null;
}
