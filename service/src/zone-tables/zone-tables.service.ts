import { Injectable } from '@nestjs/common';
import { AssetsRepository } from '../assets/assets.repository.js';
import type { AuthUser } from '../auth/auth-user.js';
import { CONTENT_TYPES, safeFileName, type ExportFile } from '../exports/export-file.js';
import { exportProvenance, interpretationProvenance } from '../exports/provenance.js';
import { tableCsv, tableOf, tableXlsx, type Provenance } from '../exports/table-files.js';
import { FormationsRepository } from '../formations/formations.repository.js';
import { FormationsService } from '../formations/formations.service.js';
import { userIdsOf } from '../interpretations/interpretations.mapper.js';
import { InterpretationsRepository } from '../interpretations/interpretations.repository.js';
import type { ZoneTableExportQueryDto, ZoneTableQueryDto } from './dto/zone-table.dto.js';
import { emptyZoneTableRow, ZONE_TABLE_COLUMNS, zoneTableRows, type ZoneTableRow } from './zone-table-rows.js';

@Injectable()
export class ZoneTablesService {
  constructor(
    private readonly interpretations: InterpretationsRepository,
    private readonly formations: FormationsService,
    private readonly formationRows: FormationsRepository,
    private readonly assets: AssetsRepository,
  ) {}

  /**
   * Zone summaries across the asset's wells from the newest version of each well (or the newest
   * approved one). With a formation: one row per well that has a top of it, empty when the
   * well has no version yet.
   */
  async table(assetId: string, query: ZoneTableQueryDto): Promise<ZoneTableRow[]> {
    return (await this.collect(assetId, query)).rows;
  }

  /** The same table as CSV or XLSX, with units in the header and the provenance of every version used. */
  async export(assetId: string, query: ZoneTableExportQueryDto, user: AuthUser): Promise<ExportFile> {
    const format = query.format ?? 'csv';
    const { rows, versions, formationName } = await this.collect(assetId, query);
    const asset = await this.assets.findById(assetId);
    const names = await this.interpretations.userNames(userIdsOf(versions.map((v) => v.row)));
    const scope = `${formationName ?? 'all formations'}, ${query.approvedOnly ? 'newest approved version' : 'newest version'} of each well`;
    const provenance: Provenance = [
      ...exportProvenance(`zone table of ${asset?.name ?? 'asset'} (${scope})`, user, new Date()),
      ['asset', asset?.name ?? ''],
      ...versions.flatMap((v) => interpretationProvenance(v.wellName, v.row, names, true)),
    ];
    const table = tableOf(ZONE_TABLE_COLUMNS, rows, (r) => r.depthUnit);
    const base = safeFileName(`${asset?.name ?? 'asset'}-zone-table${formationName ? `-${formationName}` : ''}`);
    if (format === 'csv') return { bytes: new TextEncoder().encode(tableCsv(table, provenance)), contentType: CONTENT_TYPES.csv, fileName: `${base}.csv` };
    return { bytes: await tableXlsx([{ name: 'Zones', table }], provenance), contentType: CONTENT_TYPES.xlsx, fileName: `${base}.xlsx` };
  }

  private async collect(assetId: string, query: ZoneTableQueryDto) {
    const formation = query.formationId ? await this.formations.require(assetId, query.formationId) : null;
    let versions = await this.interpretations.latestPerWell(assetId, query.approvedOnly ?? false);
    let rows = versions.flatMap((v) => zoneTableRows({ id: v.row.wellId, name: v.wellName }, v.row));
    if (formation) {
      rows = rows.filter((r) => r.formationId === formation.id);
      const tops = (await this.formationRows.topsOfAsset(assetId)).filter((t) => t.formationId === formation.id);
      for (const t of tops) if (!rows.some((r) => r.wellId === t.wellId)) rows.push(emptyZoneTableRow({ id: t.wellId, name: t.wellName }, formation));
      versions = versions.filter((v) => rows.some((r) => r.interpretationId === v.row.id));
    }
    rows.sort((a, b) => a.wellName.localeCompare(b.wellName) || (a.top ?? 0) - (b.top ?? 0));
    return { rows, versions, formationName: formation?.name ?? null };
  }
}
