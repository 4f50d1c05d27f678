export { StatsInputError } from './errors';
export { centreDecimalValues, type CentredValues } from './decimal-values';
export { fUpperTailProbability, studentTTwoSidedPValue, studentTQuantile } from './distributions';
export { fitLinearModel, type LinearEstimate, type LinearModelFit, type ModelFactor, type ModelTerm, type SequentialTermRow } from './linear-model';
export { fitTrialDesign, type DesignFit, type FactorLevelMeans, type TrialDesign, type TrialLayout } from './design-fit';
export { codeFactor, prepareTrialLayout, type PreparedLayout, type TrialObservation } from './trial-layout';
export { productCorrelationLambdas, separateMeans, type MeanSeparation, type MeanSeparationInput, type MeanSeparationMethod, type MethodComparisons, type PairComparison } from './mean-separation';
export { analyseTrial, type AnovaRow, type ResidualDiagnostic, type TreatmentMean, type TrialAnalysis, type TrialAnalysisRequest, type TrialTransform } from './analyse-trial';
