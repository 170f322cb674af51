import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { minimumCurvature } from '@poreline/core';
import type { Well, WellSurvey } from '@poreline/schema';
import type { AuthUser } from '../auth/auth-user.js';
import { convertDepth, wellDepthUnit, type DepthUnit } from '../common/well-depth.js';
import { WellsRepository } from '../wells/wells.repository.js';
import { WellsService } from '../wells/wells.service.js';
import type { SurveyDto, SurveyUploadDto } from './dto/survey.dto.js';
import { parseSurveyCsv, SurveyCsvError } from './parse-survey-csv.js';
import { SurveysRepository } from './surveys.repository.js';

export interface UploadedSurveyFile {
  originalname: string;
  buffer: Buffer;
}

/** Stations of a stored survey in the wanted depth unit (angles unchanged), ready for core. */
export interface SurveyStationsInUnit {
  depthUnit: DepthUnit;
  stations: { md: number; inc: number; azi: number }[];
}

const summary = (s: Pick<WellSurvey, 'fileName' | 'depthUnit' | 'stations'>) => ({
  fileName: s.fileName,
  depthUnit: s.depthUnit,
  stationCount: s.stations.length,
  mdFirst: s.stations[0]?.md ?? null,
  mdLast: s.stations[s.stations.length - 1]?.md ?? null,
});

@Injectable()
export class SurveysService {
  constructor(
    private readonly surveys: SurveysRepository,
    private readonly wells: WellsService,
    private readonly wellRows: WellsRepository,
  ) {}

  async get(assetId: string, wellId: string): Promise<SurveyDto> {
    await this.wells.require(assetId, wellId);
    const row = await this.surveys.find(wellId);
    if (!row) throw new NotFoundException('This well has no deviation survey yet.');
    return toSurveyDto(row);
  }

  /** Parses, checks and stores a survey CSV (replacing any earlier one); 400 naming the line on bad input. */
  async upload(assetId: string, wellId: string, file: UploadedSurveyFile | undefined, form: SurveyUploadDto, user: Pick<AuthUser, 'id'>): Promise<SurveyDto> {
    const well = await this.wells.require(assetId, wellId);
    if (!file) throw new BadRequestException('file is missing: send the survey CSV in the form field "file".');
    const fileName = Buffer.from(file.originalname, 'latin1').toString('utf8');
    let parsed;
    try {
      parsed = parseSurveyCsv(file.buffer.toString('utf8'));
    } catch (error) {
      if (error instanceof SurveyCsvError) throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: `${fileName}: ${error.message}`, line: error.line });
      throw error;
    }
    if (form.depthUnit && parsed.headerUnit && form.depthUnit !== parsed.headerUnit) {
      throw new BadRequestException(`depthUnit "${form.depthUnit}" contradicts the md header of ${fileName}, which says ${parsed.headerUnit}`);
    }
    const depthUnit = form.depthUnit ?? parsed.headerUnit ?? wellDepthUnit(await this.wellRows.logRunsOf([well.id]));
    if (!depthUnit) throw new BadRequestException('depthUnit is needed (ft or m): the md header names no unit and the well has no logs to take it from.');
    const before = await this.surveys.find(wellId);
    const values = { wellId, fileName, depthUnit, stations: parsed.stations, uploadedBy: user.id };
    const row = await this.surveys.upsert(values, {
      assetId,
      userId: user.id,
      action: before ? 'replace' : 'create',
      entity: 'well_survey',
      entityId: wellId,
      before: before ? summary(before) : null,
      after: summary(values),
    });
    return toSurveyDto(row);
  }

  /** The stored survey in the well's depth unit, or null when there is none. */
  async stationsFor(well: Well, unit: DepthUnit): Promise<SurveyStationsInUnit | null> {
    const row = await this.surveys.find(well.id);
    if (!row) return null;
    const from = row.depthUnit as DepthUnit;
    return { depthUnit: unit, stations: row.stations.map((s) => ({ md: convertDepth(s.md, from, unit), inc: s.inclination, azi: s.azimuth })) };
  }
}

function toSurveyDto(row: WellSurvey): SurveyDto {
  const path = minimumCurvature(row.stations.map((s) => ({ md: s.md, inc: s.inclination, azi: s.azimuth })));
  return {
    fileName: row.fileName,
    depthUnit: row.depthUnit as DepthUnit,
    stations: row.stations,
    tvdAtStations: Array.from(path.tvd),
    uploadedAt: row.updatedAt.toISOString(),
  };
}
