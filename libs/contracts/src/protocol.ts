// The Protocol, Sites and Plot plan part of the API (issue: protocol, sites, randomized plot plans).
import type { TrialDesign, TrialRole, TrialStatus } from './index';

export const MEASURE_KINDS = ['continuous', 'count', 'score', 'time-with-cutoff'] as const;
export type MeasureKind = (typeof MEASURE_KINDS)[number];

export const RATE_UNIT_IDS = ['lb/100ft2', 'lb/1000ft2', 'lb/acre', 'g/m2', 'kg/m2', 'kg/ha', 't/ha', 'ton/acre', 'in', 'cm', 'yd3/1000ft2'] as const;
export type RateUnitId = (typeof RATE_UNIT_IDS)[number];

export const RATE_BASES = ['area', 'concentration'] as const;
export type RateBasis = (typeof RATE_BASES)[number];

export interface Factor {
  id: number;
  /** 1 = factor A, 2 = factor B. */
  position: 1 | 2;
  name: string;
  levels: Array<{ id: number; code: string; name: string }>;
}

export interface Treatment {
  id: number;
  code: string;
  name: string;
  description: string | null;
  isControl: boolean;
  /** null for an untreated control or a treatment without an applied material. */
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
  /** For factorial trials: the level of each factor. */
  factorLevelIds: number[];
  position: number;
}

export type TreatmentInput = Omit<Treatment, 'id' | 'factorLevelIds' | 'position'> & { position?: number };

export interface Measure {
  id: number;
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

export type MeasureInput = Omit<Measure, 'id' | 'position'> & { position?: number };

export interface AssessmentRound {
  id: number;
  label: string;
  dayOffset: number;
  /** startDate + dayOffset; null while the trial has no start date. */
  dueDate: string | null;
  measureIds: number[];
}

export type RoundInput = Omit<AssessmentRound, 'id' | 'dueDate'>;

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
  /** Guardrail sentences: fewer than 4 blocks, error df below 12, one treatment. */
  warnings: string[];
}

export type SiteInput = Omit<Site, 'id' | 'areaM2' | 'leadName' | 'randomizedAt' | 'randomizationSeed' | 'plotCount' | 'hasObservations' | 'warnings'>;

export interface Plot {
  id: number;
  label: string;
  siteId: number;
  siteName: string;
  block: number;
  position: number;
  treatmentId: number;
  treatmentCode: string;
}

export interface ActivationCheck {
  ready: boolean;
  /** Each failed check in words, e.g. "Site Millbrook is not randomized yet." */
  problems: string[];
}

/** GET /api/trials/:trialId: the whole protocol. */
export interface TrialDetail {
  id: number;
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
};

/** PUT /api/trials/:trialId/factors (factorial-rcbd): treatments become every combination. */
export interface FactorsInput {
  factors: Array<{ name: string; levels: Array<{ code: string; name: string }> }>;
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
