import { Callout } from '@blueprintjs/core';

/**
 * The cautions shown next to an amount of material: dust, compost and manure, lifting, and the label.
 * Friable defers to the product label, local rules and licensed professionals.
 */
export function SafetyCautions({ title = 'Before you weigh and spread' }: { title?: string }) {
  return (
    <Callout icon="shield" intent="warning" compact className="fr-cautions" title={title}>
      <ul>
        <li>Gypsum, lime and other powders: wear a dust mask and eye protection; hydrated lime and quicklime are caustic.</li>
        <li>Compost and manure: wear gloves and wash your hands afterwards; leave time between manure and harvest.</li>
        <li>Lifting: a 5-gallon bucket of wet clay is about 30 kg (66 lb), above the 23 kg often given as a safe limit; split loads.</li>
        <li>Follow the product label and your local rules.</li>
      </ul>
    </Callout>
  );
}
