import type { OutboxMessage } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class OutboxMessageDto implements OutboxMessage {
  @ApiProperty()
  id: string;

  @ApiProperty({ format: 'date-time' })
  receivedAt: string;

  @ApiProperty()
  from: string;

  @ApiProperty({ type: [String] })
  to: string[];

  @ApiProperty()
  subject: string;

  @ApiProperty()
  text: string;

  @ApiProperty({ type: String, nullable: true })
  html: string | null;
}
