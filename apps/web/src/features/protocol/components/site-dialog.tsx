import { HTMLSelect, InputGroup, Radio, RadioGroup, TextArea } from '@blueprintjs/core';
import type { Site, SiteInput, TrialDetail } from '@friable/contracts';
import { plotSurfaceAreaM2 } from '@friable/field';
import { useState } from 'react';
import { Field, parseNumberFields } from '../../../components/field-errors';
import { FormDialog } from '../../../components/form-dialog';
import { NumberText } from '../../../components/number-text';
import { formatArea, numberInputText, parseNumberInput } from '../../../lib/format';
import { useMembers } from '../../../lib/api/get-members';
import { useSaveSite } from '../api/save-site';
import { useVersionedForm } from '../../../lib/edit-conflict';
import { LayoutChangeConfirm, type PendingLayoutChange } from './layout-change-confirm';
import { VersionConflict } from './version-conflict';
import { plotsPerWholePlot } from './factor-roles';

const shownFields = ['name', 'location', 'soilDescription', 'shape', 'lengthM', 'widthM', 'diameterCm', 'containerDepthCm', 'soilVolumeL', 'blocks', 'labelPrefix', 'leadUserId'];
const labels = { lengthM: 'Length', widthM: 'Width', diameterCm: 'Inside diameter', containerDepthCm: 'Container depth', soilVolumeL: 'Soil volume', blocks: 'Blocks' };

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
  const members = useMembers(trial.id);
  const perWholePlot = plotsPerWholePlot(trial);
  const [localError, setLocalError] = useState<Error | null>(null);
  const [name, setName] = useState(site?.name ?? '');
  const [location, setLocation] = useState(site?.location ?? '');
  const [soil, setSoil] = useState(site?.soilDescription ?? '');
  const [shape, setShape] = useState<'rectangle' | 'round'>(site?.shape ?? 'rectangle');
  const [texts, setTexts] = useState({
    lengthM: numberInputText(site?.lengthM),
    widthM: numberInputText(site?.widthM),
    diameterCm: numberInputText(site?.diameterCm),
    containerDepthCm: numberInputText(site?.containerDepthCm),
    soilVolumeL: numberInputText(site?.soilVolumeL),
    blocks: numberInputText(site?.blocks ?? 4),
  });
  const [labelPrefix, setLabelPrefix] = useState(site?.labelPrefix ?? '');
  const [leadUserId, setLeadUserId] = useState<number | null>(site?.leadUserId ?? null);
  const error = localError ?? save.error;
  const area = previewArea(shape, texts.lengthM, texts.widthM, texts.diameterCm);
  const text = (field: keyof typeof texts) => ({ value: texts[field], onChange: (value: string) => setTexts((all) => ({ ...all, [field]: value })) });
  const people = (members.data ?? []).filter((m, i, all) => all.findIndex((o) => o.userId === m.userId) === i);

  const [pending, setPending] = useState<PendingLayoutChange | null>(null);

  function submit() {
    const parsed = parseNumberFields(texts, labels);
    setLocalError(parsed.error);
    if (parsed.error) return;
    const v = parsed.values;
    const input: SiteInput = {
      name: name.trim(),
      location: location.trim() || null,
      soilDescription: soil.trim() || null,
      shape,
      lengthM: shape === 'rectangle' ? v.lengthM : null,
      widthM: shape === 'rectangle' ? v.widthM : null,
      diameterCm: shape === 'round' ? v.diameterCm : null,
      containerDepthCm: v.containerDepthCm,
      soilVolumeL: v.soilVolumeL,
      blocks: v.blocks ?? 0,
      labelPrefix: labelPrefix.trim().toUpperCase(),
      leadUserId,
    };
    // Another number of blocks clears the site's layout: what it clears is shown and the trial code typed first.
    if (site && site.plotCount > 0 && input.blocks !== site.blocks) {
      setPending({ what: `Change the blocks of ${site.name} from ${site.blocks} to ${input.blocks}`, siteId: site.id, confirmText: 'Change the blocks', proceed: () => form.send(input) });
      return;
    }
    form.send(input);
  }

  return (
    <>
      <FormDialog title={site ? `Edit site ${site.name}` : 'Add site'} icon="map-marker" wide onClose={onClose} onSubmit={submit} submitText={site ? 'Save site' : 'Add site'} pending={save.isPending} error={error} shownFields={shownFields}>
            <div className="fr-form-row">
              <Field label="Name" field="name" error={error} help="e.g. Hollow Lane Community Garden">
                <InputGroup id="fr-field-name" value={name} onChange={(e) => setName(e.target.value)} autoFocus />
              </Field>
              <Field label="Label prefix" field="labelPrefix" error={error} help="2 or 3 capital letters that start each plot label, e.g. HL → HL-101.">
                <InputGroup id="fr-field-labelPrefix" value={labelPrefix} maxLength={3} onChange={(e) => setLabelPrefix(e.target.value)} />
              </Field>
            </div>
            <Field label="Location" field="location" error={error}>
              <InputGroup id="fr-field-location" value={location} onChange={(e) => setLocation(e.target.value)} />
            </Field>
            <Field label="Soil" field="soilDescription" error={error} help="Texture, drainage, history, soil test results.">
              <TextArea id="fr-field-soilDescription" value={soil} onChange={(e) => setSoil(e.target.value)} fill autoResize />
            </Field>
            <fieldset className="fr-fieldset">
              <legend>Each plot</legend>
              {perWholePlot !== null && (
                <p className="fr-muted fr-small">
                  In a split plot this is one sub plot, the unit that is measured; a whole plot is {perWholePlot} of them side by side.
                </p>
              )}
              <Field label="Shape" field="shape" error={error}>
                <RadioGroup inline selectedValue={shape} onChange={(e) => setShape(e.currentTarget.value as 'rectangle' | 'round')}>
                  <Radio value="rectangle" label="Rectangle (bed or plot)" />
                  <Radio value="round" label="Round (container)" />
                </RadioGroup>
              </Field>
              {shape === 'rectangle' ? (
                <div className="fr-form-row">
                  <Field label="Length" field="lengthM" error={error}>
                    <NumberText id="fr-field-lengthM" {...text('lengthM')} unit="m" />
                  </Field>
                  <Field label="Width" field="widthM" error={error}>
                    <NumberText id="fr-field-widthM" {...text('widthM')} unit="m" />
                  </Field>
                </div>
              ) : (
                <Field label="Inside diameter" field="diameterCm" error={error} help="Measured inside, at the soil surface.">
                  <NumberText id="fr-field-diameterCm" {...text('diameterCm')} unit="cm" />
                </Field>
              )}
              <p className="fr-area-preview" aria-live="polite">
                Surface area: <strong>{area === null ? '—' : formatArea(area)}</strong>
              </p>
              <div className="fr-form-row">
                <Field label="Container depth" field="containerDepthCm" error={error} help="Optional; for containers.">
                  <NumberText id="fr-field-containerDepthCm" {...text('containerDepthCm')} unit="cm" />
                </Field>
                <Field label="Soil volume" field="soilVolumeL" error={error} help="Needed for concentration rates.">
                  <NumberText id="fr-field-soilVolumeL" {...text('soilVolumeL')} unit="L" />
                </Field>
              </div>
            </fieldset>
            <div className="fr-form-row">
              <Field label="Blocks" field="blocks" error={error} help="Replicates; at least 4 is the usual advice.">
                <NumberText id="fr-field-blocks" {...text('blocks')} />
              </Field>
              <Field label="Site lead" field="leadUserId" error={error} help={members.isError ? 'The team list could not be loaded.' : 'A member of the trial’s team.'}>
                <HTMLSelect id="fr-field-leadUserId" value={leadUserId ?? ''} onChange={(e) => setLeadUserId(e.target.value ? Number(e.target.value) : null)} fill>
                  <option value="">No lead yet</option>
                  {site?.leadUserId && !people.some((p) => p.userId === site.leadUserId) && <option value={site.leadUserId}>{site.leadName ?? 'Current lead'}</option>}
                  {people.map((person) => (
                    <option key={person.userId} value={person.userId}>
                      {person.name}
                    </option>
                  ))}
                </HTMLSelect>
              </Field>
            </div>
      </FormDialog>
      <VersionConflict what={`site ${site?.name ?? name}`} conflict={form.conflict} onKeepMine={form.keepMine} onTakeStored={form.takeStored} />
      <LayoutChangeConfirm trial={trial} change={pending} onClose={() => setPending(null)} />
    </>
  );
}
