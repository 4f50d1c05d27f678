import type { DoseAnswer } from '@friable/contracts';
import { computeDose, trialTotal, type PlotGeometry } from '@friable/field';
import { Injectable } from '@nestjs/common';
import { FieldProblemsException } from '../common/exceptions/field-problems.exception';
import type { DoseRequestDto } from './dto/dose-request.dto';

/** The request field a @friable/field RangeError is about ("computeDose: geometry.diameterCm must be …"). */
function requestField(message: string): string {
  const field = /^\w+: (\S+) must/.exec(message)?.[1] ?? 'rate';
  if (field === 'geometry') return 'areaM2';
  if (field === 'incorporationDepthCm') return 'depthCm';
  return field.replace(/^geometry\./, '');
}

function geometryOf(input: DoseRequestDto): PlotGeometry {
  const given = { areaM2: input.areaM2, diameterCm: input.diameterCm, lengthM: input.lengthM, widthM: input.widthM };
  return Object.fromEntries(Object.entries(given).filter(([, value]) => value !== undefined)) as PlotGeometry;
}

/** The Rate calculator behind POST /api/rates/dose: @friable/field's computeDose and trialTotal. */
@Injectable()
export class RatesService {
  dose(input: DoseRequestDto): DoseAnswer {
    try {
      const dose = computeDose({
        rate: input.rate,
        unit: input.unit,
        basis: input.basis,
        geometry: geometryOf(input),
        incorporationDepthCm: input.depthCm,
        soilVolumeL: input.soilVolumeL,
        purity: input.purity,
        moistureFraction: input.moistureFraction,
        bulkDensityKgPerL: input.bulkDensityKgPerL,
        materialKind: input.materialKind,
      });
      const answer: DoseAnswer = { ...dose, ratePerM2: { ...dose.ratePerM2 }, warnings: [...dose.warnings] };
      if (input.plots === undefined) return answer;
      const factor = 1 + (input.marginPercent ?? 0) / 100;
      const mass = dose.grams === null ? null : trialTotal({ dosePerPlotGrams: dose.grams, plots: input.plots, marginPercent: input.marginPercent ?? 0 });
      const litres = dose.litres === null ? null : dose.litres * input.plots * factor;
      answer.total = {
        grams: mass?.grams ?? null,
        kilograms: mass?.kilograms ?? null,
        pounds: mass?.pounds ?? null,
        litres,
        gallons: dose.gallons === null ? null : dose.gallons * input.plots * factor,
      };
      return answer;
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
      const field = requestField(error.message);
      // "computeDose: geometry.diameterCm must be …" → "diameterCm must be …", in the request's own field names.
      throw new FieldProblemsException([{ field, message: error.message.replace(/^\w+: \S+/, field) }]);
    }
  }
}
