import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { AnalysisModule } from '../analysis/analysis.module';
import { AuditModule } from '../audit/audit.module';
import { MailModule } from '../mail/mail.module';
import { AttachmentsController } from './attachments.controller';
import { AttachmentsService } from './attachments.service';
import { Calculation } from './calculation.entity';
import { CalculationsController } from './calculations.controller';
import { CalculationsService } from './calculations.service';
import { CalculationListsService } from './calculation-lists.service';
import { CalculationListsController, LibraryController } from './calculation-lists.controller';

@Module({
  imports: [MikroOrmModule.forFeature([Calculation]), AnalysisModule, AuditModule, MailModule],
  controllers: [
    CalculationsController,
    CalculationListsController,
    LibraryController,
    AttachmentsController,
  ],
  providers: [CalculationsService, CalculationListsService, AttachmentsService],
  exports: [CalculationsService],
})
export class CalculationsModule {}
