import { BadRequestException, Body, Controller, HttpCode, Post } from '@nestjs/common';
import type { GroundType, SpectrumGenerateResponse } from '@tiermode/shared-types';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { SpectrumGenerateDto } from './dto/spectrum-generate.dto';
import {
  asce7TwoPeriodSpectrum,
  en1998DesignSpectrum,
  en1998ElasticSpectrum,
  type En1998SpectrumType,
} from './engine/spectrum-generators';
import { ApiContract } from '../openapi/api-contract.decorator';
import { Expensive } from '../rate-limit/expensive.decorator';

/** Design spectrum generators: an editable point table from code parameters. */
@Controller('spectra')
export class SpectraController {
  @ApiContract({
    summary: 'A design spectrum from code parameters',
    body: 'SpectrumGenerateRequest',
    returns: 'SpectrumGenerateResponse',
  })
  @Post('generate')
  @Expensive()
  @HttpCode(200)
  @CheckPolicies((ability) => ability.can('create', 'Analysis'))
  generate(@Body() body: SpectrumGenerateDto): SpectrumGenerateResponse {
    try {
      return generateSpectrum(body);
    } catch (error) {
      if (error instanceof RangeError) throw new BadRequestException([error.message]);
      throw error;
    }
  }
}

function generateSpectrum(body: SpectrumGenerateDto): SpectrumGenerateResponse {
  // The DTO guarantees the fields each kind needs.
  const en = () => ({
    agR: body.agR as number,
    importanceFactor: body.importanceFactor,
    groundType: body.groundType as GroundType,
    spectrumType: body.spectrumType as En1998SpectrumType,
    maxPeriod: body.maxPeriod,
  });
  switch (body.kind) {
    case 'asce7-two-period':
      return {
        points: asce7TwoPeriodSpectrum({
          sds: body.sds as number,
          sd1: body.sd1 as number,
          tl: body.tl as number,
          maxPeriod: body.maxPeriod,
        }),
        interpolation: 'log-log',
        basis: 'ASCE 7-16 11.4.6 two-period design response spectrum (ASCE 7-22 11.4.5.2)',
      };
    case 'en1998-elastic':
      return {
        points: en1998ElasticSpectrum({ ...en(), dampingPercent: body.dampingPercent }),
        interpolation: 'log-log',
        basis: `EN 1998-1:2004 3.2.2.2 elastic spectrum, Type ${body.spectrumType}, ground ${body.groundType}`,
      };
    case 'en1998-design':
      return {
        points: en1998DesignSpectrum({ ...en(), q: body.q as number, beta: body.beta }),
        interpolation: 'log-log',
        basis: `EN 1998-1:2004 3.2.2.5 design spectrum, Type ${body.spectrumType}, ground ${body.groundType}, q = ${body.q}`,
      };
  }
}
