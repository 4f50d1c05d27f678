/** "rcbd" → "Randomized complete block", for people rather than machines. */
export const designLabels: Record<string, string> = {
  crd: 'Completely randomized',
  rcbd: 'Randomized complete block',
  'factorial-rcbd': 'Two-factor factorial in blocks',
};

export const statusLabels: Record<string, string> = {
  draft: 'Draft',
  active: 'Active',
  locked: 'Locked',
  archived: 'Archived',
};

export const roleLabels: Record<string, string> = {
  investigator: 'Investigator',
  collaborator: 'Collaborator',
  reviewer: 'Reviewer',
};

const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

export function formatDate(iso: string): string {
  return dateFormat.format(new Date(iso));
}
