export { StatsInputError } from './errors';
export { centreDecimalValues, type CentredValues } from './decimal-values';
export { fUpperTailProbability, regularizedIncompleteBeta, studentTTwoSidedPValue, studentTQuantile } from './distributions';
export { ABSORBED_LIMITS, fitAbsorbedLinearModel } from './absorbed-linear-model';
export { fitLinearModel, type LinearEstimate, type LinearModelFit, type ModelFactor, type ModelTerm, type SequentialTermRow } from './linear-model';
export { fitTrialDesign, type DesignFit, type FactorLevelMeans, type TrialDesign, type TrialLayout } from './design-fit';
export { codeFactor, prepareTrialLayout, type PreparedLayout, type TrialObservation } from './trial-layout';
export { productCorrelationLambdas, separateMeans, type MeanSeparation, type MeanSeparationInput, type MeanSeparationMethod, type MethodComparisons, type PairComparison } from './mean-separation';
export { analyseTrial, type AnovaRow, type ResidualDiagnostic, type TreatmentMean, type TrialAnalysis, type TrialAnalysisRequest, type TrialTransform } from './analyse-trial';
export { studentizedRangeCdf, studentizedRangeQuantile } from './studentized-range';
export { dunnettPValue, dunnettProbability, dunnettQuantile } from './dunnett';
export { shapiroWilk, type ShapiroWilkResult } from './shapiro-wilk';
export { brownForsythe, type BrownForsytheResult } from './brown-forsythe';
export { bartlett, bartlettFromVariances, type BartlettResult } from './bartlett';
export { friedman, type FriedmanResult } from './friedman';
export { kruskalWallis, type KruskalWallisResult } from './kruskal-wallis';
export { chiSquareUpperTail } from './chi-square';
export { adjustPValues } from './adjust-p-values';
export { compactLetterDisplay } from './compact-letters';
export { noncentralFCdf } from './noncentral-f';
export { blocksForPower, rcbdPower, type RcbdPowerInput, type RcbdPowerResult } from './power';
export { backTransform, transformValues, type TransformKind, type TransformedValues } from './transforms';
export { sumToZeroDesign, type FixedTerm, type SumToZeroDesign } from './sum-to-zero-design';
export * from './reml/index';
export { buildModelMatrix, linearPredictor, weightedCrossProduct, type ModelMatrix, type ModelMatrixTerm } from './model-matrix';
export { factorSymmetric, type SymmetricFactor } from './symmetric-factor';
export { MODEL_DESIGNS, modelLayout, type LabelledPlot, type LayoutTerm, type ModelDesign, type ModelLayout } from './model-layout';
export { dropTermTests, type LikelihoodRatioRow } from './likelihood-ratio';
export { manyToControl, manyToControlStatement, type ControlContrast, type ManyToControl } from './many-to-control';
export { productLimitCurve, type CurveMedian, type ProductLimitCurve, type ProductLimitPoint, type TimedValue } from './product-limit';
export { notDrainedCurves, type NotDrainedCurve, type NotDrainedStep, type TimedPlot } from './not-drained-curves';
export { logRank, type LogRankResult, type StratifiedTime } from './log-rank';
export { AFT_DISTRIBUTIONS, fitAcceleratedFailureTime, type AftDistribution, type AftFit } from './accelerated-failure-time';
export { analyseCensoredTimes, type CensoredObservation, type CensoredTimesAnalysis, type CensoredTimesRequest, type TreatmentCurve, type TreatmentMedian } from './censored-times';
export { categoryProbabilities, fitProportionalOdds, type ProportionalOddsFit } from './proportional-odds';
export { analyseOrdinalScores, type OrdinalScoresAnalysis, type OrdinalScoresRequest, type ScoreObservation, type ScoreRankTest } from './ordinal-scores';
export { fitPoissonLogLinear, type PoissonFit } from './poisson-regression';
export { analyseCounts, type CountFamily, type CountObservation, type CountsAnalysis, type CountsRequest, type CountTermTest } from './count-analysis';
export { layoutGrid, type LayoutGrid } from './model-layout';
export { maximizeByNewton, type LikelihoodState, type NewtonResult } from './newton-raphson';
export { compoundSymmetry, continuousAr1, unstructured, type RepeatedStructure, type RepeatedStructureName } from './repeated-covariance';
export { designOfMatrix, repeatedRemlProblem, type RepeatedRemlData } from './repeated-reml-problem';
export { splitPlotInTime, type Sphericity, type SplitPlotInTime, type SplitPlotRow } from './split-plot-in-time';
export {
  analyseRepeatedMeasures,
  repeatedMeasuresFits,
  type RepeatedStructureFit,
  type CovarianceFitSummary,
  type RepeatedCovarianceChoice,
  type RepeatedMeasuresAnalysis,
  type RepeatedMeasuresRequest,
  type RepeatedObservation,
  type RepeatedTermTest,
} from './repeated-measures';
export { summarizeValues, type ValueSummary } from './value-summary';
