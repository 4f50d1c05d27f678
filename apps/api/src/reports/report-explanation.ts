/**
 * Report explanation — the short plain paragraph of the printable report on what the statistics do and do not show.
 * Reference: Gomez & Gomez (1984), Statistical Procedures for Agricultural Research, 2nd ed., ch. 2 and 5 (the
 * analysis of variance and the comparison of treatment means), put into plain words.
 * Throws: nothing.
 * @example reportExplanation(0.05, 'Tukey'); // 'For each measure, the analysis of variance asks …'
 */
export function reportExplanation(alpha: number, method: string): string {
  return (
    'For each measure, the analysis of variance asks whether the treatments differ by more than the plot-to-plot ' +
    `variation would produce by chance, using the latest round with data at all gardens combined. A p-value below ${alpha} ` +
    `counts as a difference; treatments that share a letter (${method} comparisons) are not shown to differ. ` +
    'Where a measure has a model made for it — drain times with a cut-off, rounds over time, a baseline round, scores, ' +
    'counts — that model comes first, with why it was chosen, and the classical analysis of variance stays beside it. ' +
    'The means are least-squares means with their standard errors, and % of control compares each with the untreated control. ' +
    'These results show differences under the conditions of this trial only: they do not prove a treatment causes an ' +
    'improvement elsewhere, a large p-value does not show treatments are the same (the trial may be too small to see it), ' +
    'and values cut off at a limit or missing limit what the numbers can say. Read the cautions before drawing conclusions.'
  );
}
