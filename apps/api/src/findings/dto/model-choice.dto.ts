import { FINDINGS_ANALYSES, type AnalysisOption, type FindingsAnalysis, type ModelChoice } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class AnalysisOptionDto implements AnalysisOption {
  @ApiProperty({ enum: FINDINGS_ANALYSES, enumName: 'FindingsAnalysis' })
  analysis: FindingsAnalysis;

  @ApiProperty({ example: 'Not-drained curves and time ratios' })
  label: string;

  @ApiProperty()
  available: boolean;

  @ApiProperty({ description: 'The analysis made for this measure.' })
  isDefault: boolean;

  @ApiProperty({ type: String, nullable: true, description: 'Why it is not available, or the caution it carries.' })
  note: string | null;
}

export class ModelChoiceDto implements ModelChoice {
  @ApiProperty({ enum: FINDINGS_ANALYSES, enumName: 'FindingsAnalysis', description: 'The analysis of this answer.' })
  analysis: FindingsAnalysis;

  @ApiProperty({ enum: FINDINGS_ANALYSES, enumName: 'FindingsAnalysis', description: 'The analysis made for the measure.' })
  defaultAnalysis: FindingsAnalysis;

  @ApiProperty({ description: 'Which model and why, in plain words.' })
  why: string;

  @ApiProperty({ type: [AnalysisOptionDto] })
  options: AnalysisOptionDto[];
}
