import { IntersectionType, PartialType } from '@nestjs/swagger';
import { EditVersionDto } from '../../protocol-gate/edit-version';
import { CreateSiteDto } from './create-site.dto';

/** The fields to change, and the version they were read at. */
export class UpdateSiteDto extends IntersectionType(PartialType(CreateSiteDto), EditVersionDto) {}
