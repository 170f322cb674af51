import { Body, Controller, Get, Param, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { SURVEY_UPLOAD_MAX_BYTES } from '../common/upload-limits.js';
import { SurveyDto, SurveyUploadDto } from './dto/survey.dto.js';
import { SurveysService, type UploadedSurveyFile } from './surveys.service.js';

@ApiTags('deviation surveys')
@ApiBearerAuth()
@Controller('assets/:assetId/wells/:wellId/survey')
export class SurveysController {
  constructor(private readonly surveys: SurveysService) {}

  @Get()
  get(@Param('assetId') assetId: string, @Param('wellId') wellId: string): Promise<SurveyDto> {
    return this.surveys.get(assetId, wellId);
  }

  @Roles('petrophysicist', 'admin')
  @Post()
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' }, depthUnit: { type: 'string', enum: ['ft', 'm'] } } } })
  @UseInterceptors(FileInterceptor('file', { limits: { fileSize: SURVEY_UPLOAD_MAX_BYTES, files: 1 } }))
  upload(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @UploadedFile() file: UploadedSurveyFile | undefined, @Body() form: SurveyUploadDto, @CurrentUser() user: AuthUser): Promise<SurveyDto> {
    return this.surveys.upload(assetId, wellId, file, form, user);
  }
}
