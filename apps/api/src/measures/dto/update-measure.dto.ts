import { IntersectionType, PartialType } from '@nestjs/swagger';
import { EditVersionDto } from '../../protocol-gate/edit-version';
import { CreateMeasureDto } from './create-measure.dto';

/** The fields to change, and the version they were read at. */
export class UpdateMeasureDto extends IntersectionType(PartialType(CreateMeasureDto), EditVersionDto) {}
