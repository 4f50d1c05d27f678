import { spawnSync } from 'node:child_process';

/**
 * What keeps a live R check from running: null when Rscript and every package load, else a sentence naming the
 * Debian packages to install (a reference check fails with it rather than passing without its reference).
 */
export function missingRPackages(packages: readonly string[]): string | null {
  const probe = spawnSync('Rscript', ['-e', `for (p in c(${packages.map((p) => `"${p}"`).join(', ')})) if (!requireNamespace(p, quietly = TRUE)) cat(p, "")`], { encoding: 'utf8' });
  if (probe.error || probe.status !== 0) return 'Rscript is not installed (Debian package r-base-core)';
  const absent = probe.stdout.trim();
  return absent === '' ? null : `R lacks the package(s) ${absent} (Debian: ${absent.split(/\s+/).map((p) => `r-cran-${p.toLowerCase()}`).join(' ')})`;
}
