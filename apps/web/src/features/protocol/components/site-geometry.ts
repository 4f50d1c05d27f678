import type { PlotGeometryInput } from '@friable/contracts';
import { formatNumber } from '../../../lib/format';

/** A site's plot shape in words: "1.2 m × 1.2 m bed", "round container, 30 cm inside diameter, 25 cm deep". */
export function describeGeometry(site: PlotGeometryInput): string {
  const parts: string[] = [];
  if (site.shape === 'round') parts.push(`round, ${formatNumber(site.diameterCm ?? 0, 1)} cm inside diameter`);
  else parts.push(`${formatNumber(site.lengthM ?? 0, 2)} m × ${formatNumber(site.widthM ?? 0, 2)} m`);
  if (site.containerDepthCm !== null) parts.push(`${formatNumber(site.containerDepthCm, 1)} cm deep`);
  if (site.soilVolumeL !== null) parts.push(`${formatNumber(site.soilVolumeL, 1)} L of soil`);
  return parts.join(', ');
}
