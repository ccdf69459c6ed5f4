import { BadRequestException, Body, Controller, HttpCode, Post } from '@nestjs/common';
import type { SpectrumGenerateResponse } from '@tiermode/shared-types';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { SpectrumGenerateDto } from './dto/spectrum-generate.dto';
import { generateSpectrum } from './engine/spectrum-generators';
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
      const { points, interpolation, basis, source } = generateSpectrum(body);
      return { points, interpolation, basis, source };
    } catch (error) {
      if (error instanceof RangeError) throw new BadRequestException([error.message]);
      throw error;
    }
  }
}
