import { isModelFindings, type FindingsAnalysis, type FindingsAnswer, type SavedAnalysisChoices } from '@friable/contracts';
import type { FindingsQueryDto } from '../findings/dto/findings-query.dto';
import { resolveChoices } from '../findings/findings.service';
import { ANALYSIS_LABELS } from '../findings/model-choice';

/** The stored choices of a saved analysis; those saved before models could be saved were the classical ANOVA. */
export function savedChoicesOf(text: string): SavedAnalysisChoices {
  const stored = JSON.parse(text) as Omit<SavedAnalysisChoices, 'analysis'> & { analysis?: FindingsAnalysis };
  return { ...stored, analysis: stored.analysis ?? 'anova' };
}

/** "Not-drained curves and time ratios", "Classical ANOVA" … */
export const analysisLabel = (analysis: FindingsAnalysis): string => ANALYSIS_LABELS[analysis];

/** The choices to keep with an answer: the ANOVA's as resolved for the round analysed, the model's as the answer ran with. */
export function savedChoicesFor(query: FindingsQueryDto, answer: FindingsAnswer): SavedAnalysisChoices {
  return { ...resolveChoices(query, answer.context.choices.roundId), ...answer.context.choices, analysis: isModelFindings(answer) ? answer.analysis : 'anova' };
}
