import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { MailController } from './mail.controller';
import { MailMessage } from './mail-message.entity';
import { MailService } from './mail.service';

@Module({
  imports: [MikroOrmModule.forFeature([MailMessage])],
  controllers: [MailController],
  providers: [MailService],
  exports: [MailService],
})
export class MailModule {}
