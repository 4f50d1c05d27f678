/** Placeholder until invitations are built. */
export function AcceptInvitationPage({ token }: { token: string }) {
  return <p className="fr-muted">Invitation {token.slice(0, 6)}…</p>;
}
