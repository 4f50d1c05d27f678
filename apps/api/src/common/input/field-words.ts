/**
 * Field words — a request field's name as people read it on the screen ("plausible minimum",
 * "site", "length (m)"), for refusals: an answer never names a field the way code does ("plausibleMin",
 * "siteId"). Names the screens call differently are listed; the rest are spelled out from their parts.
 * Example: `fieldWords('incorporationDepthCm')` → "incorporation depth (cm)"; `inPeoplesWords('siteId must be a whole number')` → "site must be a whole number".
 */
const NAMED: Readonly<Record<string, string>> = Object.freeze({
  plausibleMin: 'plausible minimum',
  plausibleMax: 'plausible maximum',
  hardMin: 'lowest possible value',
  hardMax: 'highest possible value',
  scaleMin: 'lowest score',
  scaleMax: 'highest score',
  isControl: 'control',
  higherIsBetter: 'higher is better',
  acceptWarnings: 'keep an unusual value',
  noControlReason: 'reason for having no control',
  missingReason: 'reason the value is missing',
  rateValue: 'rate',
  materialKind: 'kind of material',
  leadUserId: 'site lead',
  measureIds: 'measures',
  forceLsd: 'LSD without a significant F test',
  sitesAre: 'sites are random or fixed',
  meanSeparation: 'mean separation',
  emailReminders: 'e-mail reminders',
  emailReceipts: 'e-mail receipts',
  dayOffset: 'day',
  labelPrefix: 'plot label prefix',
  targetPower: 'target power',
  cv: 'coefficient of variation',
});

/** Unit endings of field names and how the screens write them. */
const UNITS: ReadonlyArray<readonly [RegExp, string]> = [
  [/KgPerL$/, 'kg/L'],
  [/M2$/, 'm²'],
  [/Cm$/, 'cm'],
  [/Percent$/, '%'],
  [/L$/, 'L'],
  [/M$/, 'm'],
];

export function fieldWords(identifier: string): string {
  const named = NAMED[identifier];
  if (named) return named;
  let name = identifier;
  let unit = '';
  for (const [ending, symbol] of UNITS) {
    if (ending.test(name) && name.replace(ending, '').length > 1) {
      unit = ` (${symbol})`;
      name = name.replace(ending, '');
      break;
    }
  }
  // siteId → site, measureIds → measures: the thing, not its number.
  name = name.replace(/Ids$/, 's').replace(/Id$/, '');
  const words = name
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .split(' ')
    .map((word) => (word === 'Min' ? 'minimum' : word === 'Max' ? 'maximum' : /^[A-Z][a-z]/.test(word) ? word.toLowerCase() : word));
  return `${words.join(' ')}${unit}`;
}

/**
 * An identifier written the way code names things: a lower-case word, then capitals ("siteId",
 * "areaM2"). Unit symbols ("mL", "kPa", "dS/m") have one letter before their capital and stay.
 */
const CODE_NAME = /\b[a-z]{2,}(?:[A-Z][a-z0-9]*)+\b/g;

/** A message with every code-style field name in it put in people's words (and a field path's dots and indexes too). */
export function inPeoplesWords(message: string): string {
  return message
    .replace(/\b([a-zA-Z]+)\.(\d+)\.([a-zA-Z]+)\b/g, (_, list: string, index: string, field: string) => `${field} of item ${Number(index) + 1} of ${list}`)
    .replace(CODE_NAME, (identifier) => fieldWords(identifier));
}
