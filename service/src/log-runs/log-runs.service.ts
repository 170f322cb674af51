import { BadRequestException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { encodeCurveBundle, float64ToBytes, bytesToFloat64, LasParseError, readLas, recogniseCurve } from '@poreline/core';
import { createHash } from 'node:crypto';
import type { AuthUser } from '../auth/auth-user.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { WellsService } from '../wells/wells.service.js';
import { curveStats } from './curve-stats.js';
import type { UploadResponseDto, UploadResultDto } from './dto/log-run.dto.js';
import { LogRunsRepository } from './log-runs.repository.js';

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
  size: number;
}

@Injectable()
export class LogRunsService {
  constructor(
    private readonly runs: LogRunsRepository,
    private readonly wells: WellsService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /**
   * Parses and stores each file on its own: a bad file is reported and does not sink the
   * good ones; each file is stored whole (run + every curve) or not at all; a file whose
   * bytes are already stored for this well (same sha256) is reported as a duplicate.
   */
  async upload(assetId: string, wellId: string, files: UploadedFile[], user: AuthUser): Promise<UploadResponseDto> {
    await this.wells.require(assetId, wellId);
    if (!files?.length) throw new BadRequestException('No files: send one or more LAS files in the form field "files".');
    const results: UploadResultDto[] = [];
    for (const file of files) results.push(await this.uploadOne(assetId, wellId, file, user));
    if (results.every((r) => r.status === 'rejected')) {
      throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: results.map((r) => `${r.fileName}: ${r.message}`).join('; '), results });
    }
    return { results };
  }

  private async uploadOne(assetId: string, wellId: string, file: UploadedFile, user: AuthUser): Promise<UploadResultDto> {
    const fileName = Buffer.from(file.originalname, 'latin1').toString('utf8');
    const bytes = new Uint8Array(file.buffer.buffer, file.buffer.byteOffset, file.buffer.byteLength);
    const sha256 = createHash('sha256').update(bytes).digest('hex');
    const existing = await this.runs.findBySha(wellId, sha256);
    if (existing) {
      return { fileName, status: 'duplicate', logRunId: existing.id, message: `Same bytes as "${existing.fileName}", already stored for this well.`, diagnostics: [] };
    }
    let las;
    try {
      las = readLas(bytes, { maxBytes: this.config.uploadMaxBytes });
    } catch (error) {
      if (error instanceof LasParseError) {
        const where = error.line ? ` (line ${error.line})` : '';
        return { fileName, status: 'rejected', message: `${error.message}${where}`, line: error.line ?? null, diagnostics: [] };
      }
      throw error;
    }
    const index = las.curves[0].values;
    const header: Record<string, { mnemonic: string; unit: string; value: string; description: string }[]> = {};
    for (const [name, items] of Object.entries(las.sections)) {
      if (Array.isArray(items)) header[name] = items.map((i: { mnemonic: string; unit: string; value: string; description: string }) => ({ mnemonic: i.mnemonic, unit: i.unit, value: i.value, description: i.description }));
    }
    const logRunId = await this.runs.insertWithCurves(
      {
        wellId,
        fileName,
        sha256,
        sizeBytes: bytes.length,
        original: bytes,
        lasVersion: las.version,
        wrapped: las.wrapped,
        header,
        diagnostics: las.diagnostics,
        depthUnit: las.index.unit,
        start: index[0],
        stop: index[index.length - 1],
        step: las.index.step,
        rowCount: index.length,
        curveCount: las.curves.length,
        uploadedBy: user.id,
      },
      las.curves.map((c, position) => ({
        position,
        mnemonic: c.mnemonic,
        originalMnemonic: c.originalMnemonic,
        unit: c.unit,
        description: c.description,
        curveClass: position === 0 ? 'depth' : (recogniseCurve(c.mnemonic, c.unit, c.description)?.curveClass ?? null),
        samples: float64ToBytes(c.values),
        ...curveStats(c.values),
      })),
      { assetId, userId: user.id },
    );
    return { fileName, status: 'stored', logRunId, diagnostics: las.diagnostics };
  }

  /** Every curve of a run as one binary curve bundle (index first). */
  async samples(assetId: string, wellId: string, runId: string): Promise<Uint8Array> {
    await this.wells.require(assetId, wellId);
    const run = /^[0-9a-f-]{36}$/i.test(runId) ? await this.runs.findRun(wellId, runId) : undefined;
    if (!run) throw new NotFoundException('No such log run for this well.');
    const rows = await this.runs.samplesOf(runId);
    return encodeCurveBundle(
      rows.map((r) => ({ mnemonic: r.mnemonic, unit: r.unit, curveClass: r.curveClass, description: r.description })),
      rows.map((r) => bytesToFloat64(r.samples)),
    );
  }
}
