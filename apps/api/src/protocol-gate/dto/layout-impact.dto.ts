import type { LayoutImpact, LayoutImpactSite } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class LayoutImpactSiteDto implements LayoutImpactSite {
  @ApiProperty()
  siteId: number;

  @ApiProperty({ example: 'Hollow Lane' })
  siteName: string;

  @ApiProperty({ description: 'Plots of the site’s layout.' })
  plots: number;

  @ApiProperty({ description: 'Values recorded on those plots (missing values with their reason included).' })
  values: number;
}

/** GET /api/trials/:trialId/layout-impact — what a change that clears layouts would lose, asked before the change. */
export class LayoutImpactDto implements LayoutImpact {
  @ApiProperty({ type: [LayoutImpactSiteDto], description: 'The sites with a layout among those the change touches.' })
  sites: LayoutImpactSiteDto[];

  @ApiProperty({ description: 'Sites whose layout would be cleared.' })
  layouts: number;

  @ApiProperty()
  plots: number;

  @ApiProperty()
  values: number;

  @ApiProperty({ example: 'Clears the layouts of 3 sites, 60 plots: each site must be randomized again and its printed sheets and labels made anew.' })
  summary: string;

  @ApiProperty({ type: String, nullable: true, description: 'Why the change would be refused (values recorded), or null.' })
  refusal: string | null;
}
