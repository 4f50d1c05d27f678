import { IntersectionType, PartialType } from '@nestjs/swagger';
import { EditVersionDto } from '../../protocol-gate/edit-version';
import { CreateRoundDto } from './create-round.dto';

/** The fields to change, and the version they were read at. */
export class UpdateRoundDto extends IntersectionType(PartialType(CreateRoundDto), EditVersionDto) {}
