/** Placeholder until the development Outbox is built. */
export function OutboxPage() {
  return <p className="fr-muted">The development Outbox will be here.</p>;
}
