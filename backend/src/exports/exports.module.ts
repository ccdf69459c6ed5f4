import { Module } from '@nestjs/common';
import { CalculationsModule } from '../calculations/calculations.module';
import { ExportsController } from './exports.controller';

@Module({ imports: [CalculationsModule], controllers: [ExportsController] })
export class ExportsModule {}
