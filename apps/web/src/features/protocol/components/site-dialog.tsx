import { zodResolver } from '@hookform/resolvers/zod';
import type { Site, SiteInput, TrialDetail } from '@friable/contracts';
import { plotSurfaceAreaM2 } from '@friable/field';
import { useState } from 'react';
import { useForm, useWatch, type Control } from 'react-hook-form';
import { FormDialog } from '../../../components/form-dialog';
import { NumberField, RadioField, SelectField, TextAreaField, TextField } from '../../../components/form-fields';
import { formatArea, parseNumberInput } from '../../../lib/format';
import { useMembers } from '../../../lib/api/get-members';
import { useSaveSite } from '../api/save-site';
import { useVersionedForm } from '../../../lib/edit-conflict';
import { LayoutChangeConfirm, type PendingLayoutChange } from './layout-change-confirm';
import { VersionConflict } from './version-conflict';
import { plotsPerWholePlot } from './factor-roles';
import { siteSchema, siteValues, type SiteValues } from './site-schema';

const shownFields = ['name', 'location', 'soilDescription', 'shape', 'lengthM', 'widthM', 'diameterCm', 'containerDepthCm', 'soilVolumeL', 'blocks', 'labelPrefix', 'leadUserId'];
const shapeOptions = [
  { value: 'rectangle', label: 'Rectangle (bed or plot)' },
  { value: 'round', label: 'Round (container)' },
];

function previewArea(shape: 'rectangle' | 'round', length: string, width: string, diameter: string): number | null {
  try {
    if (shape === 'round') {
      const d = parseNumberInput(diameter);
      return d && d > 0 ? plotSurfaceAreaM2({ diameterCm: d }) : null;
    }
    const l = parseNumberInput(length);
    const w = parseNumberInput(width);
    return l && w && l > 0 && w > 0 ? plotSurfaceAreaM2({ lengthM: l, widthM: w }) : null;
  } catch {
    return null;
  }
}

/** Add or change a site: where it is, the soil, each plot's size and shape, the blocks and who leads it. */
export function SiteDialog({ trial, site, onClose }: { trial: TrialDetail; site: Site | null; onClose: () => void }) {
  const save = useSaveSite(trial.id);
  const form = useVersionedForm<SiteInput, Site, Parameters<typeof save.mutate>[0]>(
    save,
    (input, version) => (site ? { siteId: site.id, version: version ?? site.version, input } : { input }),
    site,
    onClose,
  );
  const { control, handleSubmit } = useForm({ resolver: zodResolver(siteSchema), defaultValues: siteValues(site) });
  const name = useWatch({ control, name: 'name' });
  const error = save.error;
  const common = { control, serverError: error };
  const [pending, setPending] = useState<PendingLayoutChange | null>(null);

  const submit = handleSubmit((input) => {
    // Another number of blocks clears the site's layout: what it clears is shown and the trial code typed first.
    if (site && site.plotCount > 0 && input.blocks !== site.blocks) {
      setPending({ what: `Change the blocks of ${site.name} from ${site.blocks} to ${input.blocks}`, siteId: site.id, confirmText: 'Change the blocks', proceed: () => form.send(input) });
      return;
    }
    form.send(input);
  });

  return (
    <>
      <FormDialog title={site ? `Edit site ${site.name}` : 'Add site'} icon="map-marker" wide onClose={onClose} onSubmit={() => void submit()} submitText={site ? 'Save site' : 'Add site'} pending={save.isPending} error={error} shownFields={shownFields}>
        <div className="fr-form-row">
          <TextField {...common} name="name" label="Name" help="e.g. Hollow Lane Community Garden" autoFocus />
          <TextField {...common} name="labelPrefix" label="Label prefix" help="2 or 3 capital letters that start each plot label, e.g. HL → HL-101." maxLength={3} />
        </div>
        <TextField {...common} name="location" label="Location" />
        <TextAreaField {...common} name="soilDescription" label="Soil" help="Texture, drainage, history, soil test results." autoResize />
        <PlotFields control={control} error={error} perWholePlot={plotsPerWholePlot(trial)} />
        <div className="fr-form-row">
          <NumberField {...common} name="blocks" label="Blocks" help="Replicates; at least 4 is the usual advice." />
          <LeadField control={control} error={error} trial={trial} site={site} />
        </div>
      </FormDialog>
      <VersionConflict what={`site ${site?.name ?? name}`} conflict={form.conflict} onKeepMine={form.keepMine} onTakeStored={form.takeStored} />
      <LayoutChangeConfirm trial={trial} change={pending} onClose={() => setPending(null)} />
    </>
  );
}

type SiteControl = Control<SiteValues, unknown, SiteInput>;

/** Each plot's shape and size, with its surface area worked out as it is typed. */
function PlotFields({ control, error, perWholePlot }: { control: SiteControl; error: unknown; perWholePlot: number | null }) {
  const [shape, length, width, diameter] = useWatch({ control, name: ['shape', 'lengthM', 'widthM', 'diameterCm'] });
  const area = previewArea(shape, length, width, diameter);
  const common = { control, serverError: error };
  return (
    <fieldset className="fr-fieldset">
      <legend>Each plot</legend>
      {perWholePlot !== null && (
        <p className="fr-muted fr-small">In a split plot this is one sub plot, the unit that is measured; a whole plot is {perWholePlot} of them side by side.</p>
      )}
      <RadioField {...common} name="shape" label="Shape" options={shapeOptions} inline />
      {shape === 'rectangle' ? (
        <div className="fr-form-row">
          <NumberField {...common} name="lengthM" label="Length" unit="m" />
          <NumberField {...common} name="widthM" label="Width" unit="m" />
        </div>
      ) : (
        <NumberField {...common} name="diameterCm" label="Inside diameter" help="Measured inside, at the soil surface." unit="cm" />
      )}
      <p className="fr-area-preview" aria-live="polite">
        Surface area: <strong>{area === null ? '—' : formatArea(area)}</strong>
      </p>
      <div className="fr-form-row">
        <NumberField {...common} name="containerDepthCm" label="Container depth" help="Optional; for containers." unit="cm" />
        <NumberField {...common} name="soilVolumeL" label="Soil volume" help="Needed for concentration rates." unit="L" />
      </div>
    </fieldset>
  );
}

/** The site lead: a member of the trial's team (the current lead stays listed even when no longer on it). */
function LeadField({ control, error, trial, site }: { control: SiteControl; error: unknown; trial: TrialDetail; site: Site | null }) {
  const members = useMembers(trial.id);
  const people = (members.data ?? []).filter((m, i, all) => all.findIndex((o) => o.userId === m.userId) === i);
  const formerLead = site?.leadUserId && !people.some((p) => p.userId === site.leadUserId) ? [{ value: String(site.leadUserId), label: site.leadName ?? 'Current lead' }] : [];
  return (
    <SelectField
      control={control}
      serverError={error}
      name="leadUserId"
      label="Site lead"
      help={members.isError ? 'The team list could not be loaded.' : 'A member of the trial’s team.'}
      options={[{ value: '', label: 'No lead yet' }, ...formerLead, ...people.map((person) => ({ value: String(person.userId), label: person.name }))]}
    />
  );
}
