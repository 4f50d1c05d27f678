import type { ProblemBody } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

export class ProblemDetailDto {
  @ApiPropertyOptional({ description: 'The field as the request names it.' })
  field?: string;

  @ApiPropertyOptional({ description: 'A row of an uploaded file as a spreadsheet numbers it (the header is row 1).' })
  row?: number;

  @ApiPropertyOptional({ description: 'A column header of an uploaded file.' })
  column?: string;

  @ApiProperty()
  message: string;
}

/** The body of every error answer (see ProblemFilter). */
export class ProblemDto implements ProblemBody {
  @ApiProperty({ example: 422 })
  statusCode: number;

  @ApiProperty({ example: 'Unprocessable Entity' })
  error: string;

  @ApiProperty({ description: 'A sentence for people.' })
  message: string;

  @ApiPropertyOptional({ type: [ProblemDetailDto], description: 'Each problem by field, or by row and column of a file.' })
  errors?: ProblemDetailDto[];
}
