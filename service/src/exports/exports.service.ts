import { Injectable } from '@nestjs/common';
import { AssetsRepository } from '../assets/assets.repository.js';
import type { AuthUser } from '../auth/auth-user.js';
import { EvaluationService } from '../interpretations/evaluation.service.js';
import { userIdsOf } from '../interpretations/interpretations.mapper.js';
import { InterpretationsRepository } from '../interpretations/interpretations.repository.js';
import { inputsOf, InterpretationsService } from '../interpretations/interpretations.service.js';
import { WellsService } from '../wells/wells.service.js';
import { ZONE_TABLE_COLUMNS, zoneTableRows } from '../zone-tables/zone-table-rows.js';
import type { INTERPRETATION_FORMATS } from './dto/export-query.dto.js';
import { CONTENT_TYPES, flattenParameters, safeFileName, type ExportFile } from './export-file.js';
import { interpretationLas } from './interpretation-las.js';
import { exportProvenance, interpretationProvenance } from './provenance.js';
import { tableCsv, tableOf, tableXlsx } from './table-files.js';

@Injectable()
export class ExportsService {
  constructor(
    private readonly interpretations: InterpretationsService,
    private readonly rows: InterpretationsRepository,
    private readonly evaluation: EvaluationService,
    private readonly wells: WellsService,
    private readonly assets: AssetsRepository,
  ) {}

  /**
   * One interpretation version as CSV or XLSX (its zone table, units in the header, provenance
   * with file sha256s and the parameter snapshot) or as LAS 2.0 (the merged input curves and
   * the computed curves, evaluated again from the stored snapshot with the same core code).
   */
  async interpretation(assetId: string, wellId: string, id: string, format: (typeof INTERPRETATION_FORMATS)[number], user: AuthUser): Promise<ExportFile> {
    const row = await this.interpretations.require(assetId, wellId, id);
    const well = await this.wells.require(assetId, wellId);
    const asset = await this.assets.findById(assetId);
    const names = await this.rows.userNames(userIdsOf([row]));
    const provenance = [
      ...exportProvenance(`interpretation of ${well.name}, version ${row.version} (${format})`, user, new Date()),
      ['asset', asset?.name ?? ''] as [string, string],
      ['well', `${well.name}${well.uwi ? ` (UWI ${well.uwi})` : ''}`] as [string, string],
      ...interpretationProvenance(well.name, row, names, true),
    ];
    const base = safeFileName(`${well.name}-v${row.version}-${row.status}`);
    if (format === 'las') {
      const { result, merged } = await this.evaluation.evaluate(wellId, inputsOf(row));
      const text = interpretationLas({ name: well.name, uwi: well.uwi, field: asset?.name ?? '' }, merged, result, provenance);
      return { bytes: new TextEncoder().encode(text), contentType: CONTENT_TYPES.las, fileName: `${base}.las` };
    }
    const table = tableOf(ZONE_TABLE_COLUMNS, zoneTableRows(well, row), (r) => r.depthUnit);
    if (format === 'csv') return { bytes: new TextEncoder().encode(tableCsv(table, provenance)), contentType: CONTENT_TYPES.csv, fileName: `${base}.csv` };
    const parameters = {
      header: ['Zone', 'Top', 'Base', 'Parameter', 'Value'],
      rows: inputsOf(row).zones.flatMap((z) => flattenParameters(z.params).map(([k, v]) => [z.name, z.top, z.base, k, v])),
    };
    const bytes = await tableXlsx([{ name: 'Zones', table }, { name: 'Parameters', table: parameters }], provenance);
    return { bytes, contentType: CONTENT_TYPES.xlsx, fileName: `${base}.xlsx` };
  }
}
