/** The kinds of change, grouped by what they change (the part of `kind` before the dot). */
export const activityGroups: ReadonlyArray<{ prefix: string; label: string; kinds: Readonly<Record<string, string>> }> = [
  { prefix: 'trial', label: 'Trial', kinds: { 'trial.created': 'Trial created', 'trial.updated': 'Trial details changed', 'trial.status-changed': 'Trial status changed' } },
  { prefix: 'treatment', label: 'Treatments', kinds: { 'treatment.created': 'Treatment added', 'treatment.updated': 'Treatment changed', 'treatment.archived': 'Treatment archived' } },
  { prefix: 'factors', label: 'Factors', kinds: { 'factors.replaced': 'Factors set' } },
  { prefix: 'measure', label: 'Measures', kinds: { 'measure.created': 'Measure added', 'measure.updated': 'Measure changed', 'measure.archived': 'Measure archived' } },
  { prefix: 'round', label: 'Assessment rounds', kinds: { 'round.created': 'Round added', 'round.updated': 'Round changed', 'round.archived': 'Round archived' } },
  {
    prefix: 'site',
    label: 'Sites',
    kinds: { 'site.created': 'Site added', 'site.updated': 'Site changed', 'site.archived': 'Site archived', 'site.randomized': 'Site randomized', 'site.layout-cleared': 'Site layout cleared' },
  },
  {
    prefix: 'invitation',
    label: 'Invitations',
    kinds: { 'invitation.sent': 'Invitation sent', 'invitation.resent': 'Invitation sent again', 'invitation.revoked': 'Invitation withdrawn', 'invitation.accepted': 'Invitation accepted' },
  },
  { prefix: 'member', label: 'Team', kinds: { 'member.changed': 'Role or sites changed', 'member.removed': 'Member removed' } },
  { prefix: 'intake', label: 'Intake uploads', kinds: { 'intake.committed': 'Upload committed' } },
  { prefix: 'observation', label: 'Values', kinds: { 'observation.created': 'Value entered', 'observation.edited': 'Value changed' } },
  { prefix: 'photo', label: 'Photos', kinds: { 'photo.added': 'Photo added', 'photo.replaced': 'Photo replaced', 'photo.removed': 'Photo removed' } },
  {
    prefix: 'analysis',
    label: 'Analyses and review',
    kinds: {
      'analysis.saved': 'Analysis saved',
      'analysis.review-requested': 'Review requested',
      'analysis.signed-off': 'Analysis signed off',
      'analysis.sign-off-amended': 'Sign-off statement amended',
      'analysis.sign-off-withdrawn': 'Sign-off withdrawn',
      'analysis.commented': 'Comment added',
      'analysis.comment-replied': 'Reply added',
      'analysis.comment-changed': 'Comment edited or resolved',
      'analysis.comment-deleted': 'Comment deleted',
    },
  },
];

/**
 * A kind of change for people: 'site.randomized' → "Site randomized"; a kind Friable has no words for
 * yet keeps its group's name and its verb ('analysis.saved' → "Analyses: saved").
 */
export function activityKindLabel(kind: string): string {
  const [prefix = '', verb = ''] = kind.split('.');
  const group = activityGroups.find((g) => g.prefix === prefix);
  return group?.kinds[kind] ?? `${group?.label ?? prefix}: ${verb.replace(/-/g, ' ')}`;
}

/** Whether an entry's kind falls under the chosen filter: a whole group ('site') or one kind ('site.randomized'). */
export function kindMatches(kind: string, chosen: string): boolean {
  if (!chosen) return true;
  return chosen.includes('.') ? kind === chosen : kind.startsWith(`${chosen}.`);
}
