import { Module } from '@nestjs/common';
import { CalculationsModule } from '../calculations/calculations.module';
import { ReportsController } from './reports.controller';

@Module({ imports: [CalculationsModule], controllers: [ReportsController] })
export class ReportsModule {}
