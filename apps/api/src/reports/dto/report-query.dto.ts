import { PickType } from '@nestjs/swagger';
import { FindingsQueryDto } from '../../findings/dto/findings-query.dto';

/** GET /api/trials/:trialId/report — the Findings page's choices the printed report follows (query text), worded as Findings words them. */
export class ReportQueryDto extends PickType(FindingsQueryDto, ['roundId', 'siteId', 'sitesAre', 'method', 'alpha'] as const) {}
