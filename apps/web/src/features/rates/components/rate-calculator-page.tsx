/** Placeholder until the Rate calculator is built. */
export function RateCalculatorPage() {
  return <p className="fr-muted">The Rate calculator will be here.</p>;
}
