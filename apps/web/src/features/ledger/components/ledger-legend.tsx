/** What the looks of the Ledger's cells mean: never colour alone, always a mark and a word. */
export function LedgerLegend() {
  return (
    <ul className="fr-ledger-legend" aria-label="How values are shown">
      <li>
        <span className="fr-ledger-value">412</span> measured
      </li>
      <li>
        <span className="fr-ledger-value fr-ledger-value--censored">
          &gt;600<sup aria-hidden="true">c</sup>
        </span>{' '}
        censored: not reached by the cut-off (more than 600)
      </li>
      <li>
        <span className="fr-ledger-value fr-ledger-value--missing">
          NA<sup aria-hidden="true">m</sup>
        </span>{' '}
        missing, with its reason
      </li>
      <li>
        <span className="fr-ledger-value fr-ledger-value--error">
          abc<sup aria-hidden="true">!</sup>
        </span>{' '}
        refused by the server: see the message below the grid
      </li>
    </ul>
  );
}
