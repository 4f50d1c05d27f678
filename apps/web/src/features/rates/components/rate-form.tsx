import { Card, H3 } from '@blueprintjs/core';
import type { ReactNode } from 'react';
import { useController, type Control, type FieldPathByValue } from 'react-hook-form';
import { Field } from '../../../components/field-errors';
import { CustomField, RadioField, SelectField } from '../../../components/form-fields';
import { NumberText } from '../../../components/number-text';
import { RateUnitSelect } from '../../../components/rate-unit-select';
import type { DoseFormState } from './dose-form-state';

type TextName = FieldPathByValue<DoseFormState, string>;

const lengthUnits = [
  { value: 'm', label: 'm' },
  { value: 'ft', label: 'ft' },
];
const diameterUnits = [
  { value: 'cm', label: 'cm' },
  { value: 'in', label: 'in' },
];
const areaUnits = [
  { value: 'm2', label: 'm²' },
  { value: 'ft2', label: 'ft²' },
];

const basisOptions = [
  { value: 'area', label: 'Per area: spread over the surface' },
  { value: 'concentration', label: 'Concentration: mixed through a container, matching a field rate worked in to a depth' },
];
const geometryOptions = [
  { value: 'rectangle', label: 'Length × width' },
  { value: 'round', label: 'Round (inside diameter)' },
  { value: 'area', label: 'Known area' },
];
const materialOptions = [
  { value: 'gypsum', label: 'Gypsum' },
  { value: 'other', label: 'Other material' },
];

interface FieldProps {
  control: Control<DoseFormState>;
  /** The API's name for the field, which its refusals name. */
  field: string;
  label: string;
  error: unknown;
  help?: ReactNode;
}

type UnitChoice = { name: TextName; label: string; options: Array<{ value: string; label: string }> };

/** A number box of the form, with an optional fixed unit or a unit the person picks beside it. */
function NumberField({ control, name, field, label, error, help, unit, unitChoice }: FieldProps & { name: TextName; unit?: string; unitChoice?: UnitChoice }) {
  const { field: box } = useController({ control, name });
  const id = `fr-field-${field}`;
  return (
    <Field label={label} field={field} error={error} help={help}>
      {unitChoice ? <NumberWithUnit control={control} id={id} box={box} choice={unitChoice} /> : <NumberText id={id} value={box.value} onChange={box.onChange} unit={unit} />}
    </Field>
  );
}

function NumberWithUnit({ control, id, box, choice }: { control: Control<DoseFormState>; id: string; box: { value: string; onChange: (text: string) => void }; choice: UnitChoice }) {
  const { field: unitBox } = useController({ control, name: choice.name });
  return <NumberText id={id} value={box.value} onChange={box.onChange} unitChoice={{ label: choice.label, options: choice.options, value: unitBox.value, onChange: unitBox.onChange }} />;
}

/** The Rate calculator's boxes (react-hook-form); what they hold is read by the page as it changes. */
export function RateForm({ control, form, volume, error }: { control: Control<DoseFormState>; form: DoseFormState; volume: boolean; error: unknown }) {
  const common = { control, error };
  return (
    <Card elevation={0} className="fr-rates__form">
      <H3>Rate</H3>
      <div className="fr-form-row">
        <NumberField {...common} name="rate" field="rate" label="Rate" />
        <CustomField control={control} serverError={error} name="unit" label="Unit">
          {(box, id) => <RateUnitSelect id={id} value={box.value} onChange={box.onChange} />}
        </CustomField>
      </div>
      <SelectField control={control} serverError={error} name="materialKind" label="Material" help="Gypsum rates are compared with common garden rates." options={materialOptions} />
      <RadioField control={control} serverError={error} name="basis" label="Basis" options={basisOptions} />
      {form.basis === 'concentration' && (
        <div className="fr-form-row">
          <NumberField {...common} name="depthCm" field="depthCm" label="Incorporation depth" help="How deep the field rate is mixed in." unit="cm" />
          <NumberField {...common} name="soilVolumeL" field="soilVolumeL" label="Soil volume" help="Soil in one container." unit="L" />
        </div>
      )}
      <H3>Plot or container</H3>
      <RadioField control={control} serverError={error} inline name="geometry" label="Size given as" options={geometryOptions} />
      {form.geometry === 'rectangle' && (
        <div className="fr-form-row">
          <NumberField {...common} name="length" field="lengthM" label="Length" unitChoice={{ name: 'lengthUnit', label: 'Length unit', options: lengthUnits }} />
          <NumberField {...common} name="width" field="widthM" label="Width" unitChoice={{ name: 'lengthUnit', label: 'Width unit', options: lengthUnits }} />
        </div>
      )}
      {form.geometry === 'round' && (
        <NumberField {...common} name="diameter" field="diameterCm" label="Inside diameter" help="Inside the pot, at the soil surface." unitChoice={{ name: 'diameterUnit', label: 'Diameter unit', options: diameterUnits }} />
      )}
      {form.geometry === 'area' && <NumberField {...common} name="area" field="areaM2" label="Surface area" unitChoice={{ name: 'areaUnit', label: 'Area unit', options: areaUnits }} />}
      {!volume && (
        <>
          <H3>Product</H3>
          <div className="fr-form-row">
            <NumberField {...common} name="purityPercent" field="purity" label="Purity (optional)" help="When the rate is for the active material only." unit="% active" />
            <NumberField {...common} name="moisturePercent" field="moistureFraction" label="Water share (optional)" help="When the rate is for dry matter." unit="% water" />
          </div>
        </>
      )}
      <H3>How many</H3>
      <div className="fr-form-row">
        <NumberField {...common} name="plots" field="plots" label="Plots" help="Plots or containers that get this rate." />
      </div>
    </Card>
  );
}
