import type { ActivityEntry } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class ActivityEntryDto implements ActivityEntry {
  @ApiProperty()
  id: number;

  @ApiProperty({ format: 'date-time' })
  at: string;

  @ApiProperty({ type: Number, nullable: true })
  userId: number | null;

  @ApiProperty({ type: String, nullable: true })
  userName: string | null;

  @ApiProperty({ example: 'site.randomized', description: "e.g. 'trial.created', 'treatment.updated', 'site.randomized', 'invitation.sent'." })
  kind: string;

  @ApiProperty({ type: Number, nullable: true })
  siteId: number | null;

  @ApiProperty()
  summary: string;

  @ApiProperty({ type: 'object', additionalProperties: true })
  details: Record<string, unknown>;
}
