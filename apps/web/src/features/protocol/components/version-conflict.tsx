import type { EditConflict } from '../../../lib/edit-conflict';
import { conflictRows, EditConflictDialog } from '../../../components/edit-conflict-dialog';

/** Protocol fields as the forms name them (a field not listed shows its own name). */
const fieldLabels: Record<string, string> = {
  code: 'Code', name: 'Name', title: 'Title', question: 'Question', design: 'Design', startDate: 'Start date', seed: 'Seed',
  safetyNotes: 'Safety notes', noControlReason: 'Why no control', status: 'Status', description: 'Description', isControl: 'Control',
  rateValue: 'Rate', rateUnit: 'Rate unit', rateBasis: 'Basis', incorporationDepthCm: 'Incorporation depth', product: 'Product',
  purity: 'Purity', moistureBasis: 'Rate is for', moistureFraction: 'Water share', materialKind: 'Material', unit: 'Unit', kind: 'Kind',
  scaleMin: 'Scale from', scaleMax: 'Scale to', cutoff: 'Cut-off', plausibleMin: 'Plausible from', plausibleMax: 'Plausible to',
  hardMin: 'Hard minimum', hardMax: 'Hard maximum', decimals: 'Decimals', higherIsBetter: 'Higher is better', label: 'Label',
  dayOffset: 'Day', measureIds: 'Measures', location: 'Location', soilDescription: 'Soil', shape: 'Shape', lengthM: 'Length',
  widthM: 'Width', diameterCm: 'Inside diameter', containerDepthCm: 'Container depth', soilVolumeL: 'Soil volume', blocks: 'Blocks',
  labelPrefix: 'Label prefix', leadUserId: 'Lead', factors: 'Factors',
};

/** A protocol edit refused because someone else saved first: the differing fields, theirs and the stored ones. */
export function VersionConflict<TMine extends object>({
  what,
  conflict,
  onKeepMine,
  onTakeStored,
}: {
  /** The record as people name it, e.g. "treatment G40". */
  what: string;
  conflict: EditConflict<TMine, object> | null;
  onKeepMine: () => void;
  onTakeStored: () => void;
}) {
  if (!conflict) return null;
  const rows = conflictRows<TMine>(conflict.mine, conflict.current as TMine, fieldLabels as Partial<Record<keyof TMine, string>>);
  return (
    <EditConflictDialog
      title={`Someone else changed ${what}`}
      intro={<>While you were editing {what}, someone else saved it.{rows.length === 0 && ' The fields you sent already hold your values.'}</>}
      rows={rows}
      labelled
      onKeepMine={onKeepMine}
      onTakeStored={onTakeStored}
    />
  );
}
