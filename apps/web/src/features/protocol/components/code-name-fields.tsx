import { InputGroup } from '@blueprintjs/core';
import { Field } from '../../../components/field-errors';

/** The Code and Name boxes that open a treatment's or a measure's dialog, side by side. */
export function CodeNameFields({ code, name, onCode, onName, codeHelp, error }: { code: string; name: string; onCode: (text: string) => void; onName: (text: string) => void; codeHelp: string; error: unknown }) {
  return (
    <div className="fr-form-row">
      <Field label="Code" field="code" error={error} help={codeHelp}>
        <InputGroup id="fr-field-code" value={code} onChange={(e) => onCode(e.target.value)} autoFocus />
      </Field>
      <Field label="Name" field="name" error={error}>
        <InputGroup id="fr-field-name" value={name} onChange={(e) => onName(e.target.value)} />
      </Field>
    </div>
  );
}
