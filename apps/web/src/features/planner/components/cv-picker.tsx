import { Callout, HTMLSelect } from '@blueprintjs/core';
import { isModelFindings, type TrialSummary } from '@friable/contracts';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { analysisQueryOptions } from '../../../lib/api/get-analysis';
import { useAnalyses } from '../../../lib/api/get-analyses';

/** Where a CV came from, in words, with a caution when it is not on the measure's own scale. */
export interface PickedCv {
  cv: number;
  from: string;
  caution: string | null;
}

/** Takes the CV of a saved analysis from one of the person's trials. */
export function CvPicker({ trials, onPick }: { trials: TrialSummary[]; onPick: (picked: PickedCv) => void }) {
  const queryClient = useQueryClient();
  const [trialId, setTrialId] = useState<number | undefined>();
  const [problem, setProblem] = useState<string | null>(null);
  const analyses = useAnalyses(trialId);

  async function pick(analysisId: number) {
    if (!trialId || !analysisId) return;
    setProblem(null);
    try {
      const snapshot = await queryClient.fetchQuery({ ...analysisQueryOptions(trialId, analysisId), staleTime: Infinity });
      const transform = snapshot.choices.transform;
      if (isModelFindings(snapshot.result)) {
        setProblem(`“${snapshot.title}” is saved as ${snapshot.analysisLabel.toLowerCase()}, which gives no coefficient of variation: choose a saved classical ANOVA.`);
        return;
      }
      onPick({
        // One decimal, as a person would type it.
        cv: Math.round(snapshot.result.summary.cv * 10) / 10,
        from: `${snapshot.title} (${snapshot.measureName}, ${snapshot.roundLabel}, ${snapshot.scopeLabel})`,
        caution: transform !== 'none' ? `That analysis used a ${transform} transform, so its CV describes the transformed values, not the measure itself.` : null,
      });
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The saved analysis could not be read.');
    }
  }

  return (
    <div className="fr-planner__cv-picker">
      <label className="fr-site-picker">
        <span>CV from a saved analysis of</span>
        <HTMLSelect aria-label="Earlier trial" value={trialId ?? ''} onChange={(event) => setTrialId(Number(event.target.value) || undefined)}>
          <option value="">choose a trial…</option>
          {trials.map((trial) => (
            <option key={trial.id} value={trial.id}>
              {trial.code} — {trial.title}
            </option>
          ))}
        </HTMLSelect>
      </label>
      {trialId !== undefined &&
        (analyses.isPending ? (
          <span className="fr-muted">Loading its saved analyses…</span>
        ) : analyses.isError ? (
          <span className="fr-muted">{analyses.error.message}</span>
        ) : analyses.data.length === 0 ? (
          <span className="fr-muted">This trial has no saved analyses yet; save one on its Findings tab.</span>
        ) : (
          <HTMLSelect aria-label="Saved analysis" defaultValue="" onChange={(event) => void pick(Number(event.target.value))}>
            <option value="">choose an analysis…</option>
            {analyses.data.map((analysis) => (
              <option key={analysis.id} value={analysis.id}>
                {analysis.title} · {analysis.measureName}, {analysis.roundLabel}
              </option>
            ))}
          </HTMLSelect>
        ))}
      {problem && (
        <Callout intent="danger" compact role="alert">
          {problem}
        </Callout>
      )}
    </div>
  );
}
