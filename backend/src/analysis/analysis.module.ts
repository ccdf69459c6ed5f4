import { ChecksController } from './checks.controller';
import { Module } from '@nestjs/common';
import { AnalysisController } from './analysis.controller';
import { AnalysisService } from './analysis.service';
import { SpectraController } from './spectra.controller';
import { HistoryController } from './history.controller';

@Module({
  controllers: [AnalysisController, SpectraController, ChecksController, HistoryController],
  providers: [AnalysisService],
  exports: [AnalysisService],
})
export class AnalysisModule {}
