import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiOkResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import { SignedIn } from '../common/decorators/access.decorator';
import { DoseRequestDto } from './dto/dose-request.dto';
import { RatesService } from './rates.service';
import { DoseAnswerDto } from './dto/dose-answer.dto';

@ApiTags('rates')
@Controller('rates')
export class RatesController {
  constructor(private readonly rates: RatesService) {}

  @Post('dose')
  @HttpCode(200)
  @SignedIn()
  @ApiOkResponse({ type: DoseAnswerDto, description: 'DoseAnswer: grams, kilograms, ounces, pounds (litres and gallons for depth rates), warnings.' })
  @ApiUnprocessableEntityResponse({ description: 'A field is missing or out of range; the error names it.' })
  dose(@Body() body: DoseRequestDto) {
    return this.rates.dose(body);
  }
}
