import contentDisposition from 'content-disposition';
import {
  Controller,
  Delete,
  Get,
  Param,
  Post,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
  BadRequestException,
} from '@nestjs/common';
import type { CalculationDto } from '@tiermode/shared-types';
import type { AppAbility } from '../authorization/app-ability';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { CurrentAbility, CurrentUser } from '../authorization/current.decorators';
import { UuidParam } from '../common/pipes/uuid-param.pipe';
import { uploadLimits } from '../imports/upload-limits.interceptor';
import type { User } from '../users/user.entity';
import { AttachmentsService } from './attachments.service';
import { ApiContract } from '../openapi/api-contract.decorator';

const ATTACHMENT_LIMIT = 10 * 1024 * 1024;

@Controller()
export class AttachmentsController {
  constructor(private readonly attachments: AttachmentsService) {}

  /** Keeps a PDF, PNG or JPEG (at most 10 MB) with a draft calc; answers with the calc. */
  @ApiContract({
    summary: 'Keep a PDF, PNG or JPEG (at most 10 MB) with a draft',
    returns: 'CalculationDto',
    upload: { description: 'The file; its type is judged by its content' },
  })
  @Post('calculations/:id/attachments')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  @UseInterceptors(uploadLimits(ATTACHMENT_LIMIT, '10 MB'))
  add(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
    @UploadedFile() file: Express.Multer.File | undefined,
  ): Promise<CalculationDto> {
    if (!file) throw new BadRequestException(['file must be a PDF, PNG or JPEG']);
    return this.attachments.add(ability, user, id, file);
  }

  @ApiContract({
    summary: 'Remove an attachment from a draft (its author only)',
    returns: 'CalculationDto',
  })
  @Delete('attachments/:id')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  remove(
    @CurrentAbility() ability: AppAbility,
    @CurrentUser() user: User,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<CalculationDto> {
    return this.attachments.remove(ability, user, id);
  }

  @ApiContract({
    summary: 'Download an attachment (its SHA-256 is checked first)',
    file: 'application/octet-stream',
  })
  @Get('attachments/:id')
  @CheckPolicies((ability) => ability.can('read', 'Calculation'))
  async download(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<StreamableFile> {
    const { attachment, bytes } = await this.attachments.download(ability, id);
    return new StreamableFile(bytes, {
      type: attachment.contentType,
      // An ASCII fallback and the UTF-8 name (RFC 6266 with RFC 8187's filename*).
      disposition: contentDisposition(attachment.fileName, {
        fallback: attachment.fileName
          .normalize('NFKD')
          .replace(/[\u0300-\u036f]/g, '')
          .replace(/[^\x20-\x7e]/g, '_'),
      }),
    });
  }
}
