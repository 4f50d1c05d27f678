import { IntersectionType, PartialType } from '@nestjs/swagger';
import { EditVersionDto } from '../../protocol-gate/edit-version';
import { CreateTreatmentDto } from './create-treatment.dto';

/** The fields to change, and the version they were read at. */
export class UpdateTreatmentDto extends IntersectionType(PartialType(CreateTreatmentDto), EditVersionDto) {}
