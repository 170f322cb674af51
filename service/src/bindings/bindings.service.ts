import { BadRequestException, Injectable } from '@nestjs/common';
import { CURVE_CLASSES, normaliseCurveUnits } from '@poreline/core';
import type { AuthUser } from '../auth/auth-user.js';
import { WellsRepository } from '../wells/wells.repository.js';
import { WellsService } from '../wells/wells.service.js';
import { BINDING_CLASSES, BINDING_KEYS } from './binding-keys.js';
import { BindingsRepository } from './bindings.repository.js';
import type { BindingDto, PutBindingsDto } from './dto/bindings.dto.js';
import { proposeBindings } from './propose-bindings.js';

interface WellCurve {
  logRunId: string;
  fileName: string;
  mnemonic: string;
  unit: string;
  curveClass: string | null;
  valueCount: number;
  unitFits: boolean;
}

/** True when the unit is one of the class's quantity (or missing, when the canonical unit is assumed). */
function unitFits(unit: string, curveClass: string | null): boolean {
  const info = CURVE_CLASSES.find((c) => c.curveClass === curveClass);
  if (!info) return false;
  try {
    normaliseCurveUnits([], unit, info.curveClass);
    return true;
  } catch {
    return false;
  }
}

const auditView = (b: readonly BindingDto[]) => b.map((x) => ({ binding: x.binding, fileName: x.fileName, mnemonic: x.mnemonic }));

@Injectable()
export class BindingsService {
  constructor(
    private readonly bindings: BindingsRepository,
    private readonly wells: WellsService,
    private readonly wellRows: WellsRepository,
  ) {}

  async list(assetId: string, wellId: string): Promise<BindingDto[]> {
    await this.wells.require(assetId, wellId);
    return this.effective(wellId);
  }

  /**
   * The bindings the evaluation uses: the stored set once the user has confirmed one (it is
   * then the whole truth: an input left out is unbound), otherwise the reader's proposal.
   */
  async effective(wellId: string): Promise<BindingDto[]> {
    const curves = await this.curvesOf(wellId);
    const stored = await this.bindings.listByWell(wellId);
    if (stored.length) {
      return BINDING_KEYS.flatMap((key) => {
        const b = stored.find((s) => s.binding === key);
        const c = b && curves.find((x) => x.logRunId === b.logRunId && x.mnemonic === b.mnemonic);
        return b && c ? [{ binding: key, logRunId: b.logRunId, fileName: c.fileName, mnemonic: b.mnemonic, unit: c.unit, confirmed: b.confirmed, proposed: false }] : [];
      });
    }
    const proposal = proposeBindings(curves);
    return BINDING_KEYS.flatMap((key) => {
      const c = proposal.get(key);
      return c ? [{ binding: key, logRunId: c.logRunId, fileName: c.fileName, mnemonic: c.mnemonic, unit: c.unit, confirmed: false, proposed: true }] : [];
    });
  }

  /** Confirms a full set of bindings: each input once, each curve from a run of this well with a unit of the input's kind. */
  async replace(assetId: string, wellId: string, body: PutBindingsDto, user: Pick<AuthUser, 'id'>): Promise<BindingDto[]> {
    await this.wells.require(assetId, wellId);
    const curves = await this.curvesOf(wellId);
    const seen = new Set<string>();
    body.bindings.forEach((b, i) => {
      if (seen.has(b.binding)) throw new BadRequestException(`bindings[${i}].binding "${b.binding}" is listed twice`);
      seen.add(b.binding);
      if (!curves.some((c) => c.logRunId === b.logRunId)) throw new BadRequestException(`bindings[${i}].logRunId is not a log run of this well`);
      const curve = curves.find((c) => c.logRunId === b.logRunId && c.mnemonic === b.mnemonic);
      if (!curve) throw new BadRequestException(`bindings[${i}].mnemonic "${b.mnemonic}" is not a curve of that log run`);
      try {
        normaliseCurveUnits([], curve.unit, BINDING_CLASSES[b.binding]);
      } catch (error) {
        throw new BadRequestException(`bindings[${i}].mnemonic "${b.mnemonic}" cannot be ${b.binding}: ${(error as Error).message.replace(/^normaliseCurveUnits: /, '')}`);
      }
    });
    const before = await this.effective(wellId);
    const rows = body.bindings.map((b) => ({ binding: b.binding, logRunId: b.logRunId, mnemonic: b.mnemonic, confirmed: true }));
    const after = body.bindings.map((b) => ({ binding: b.binding, fileName: curves.find((c) => c.logRunId === b.logRunId)!.fileName, mnemonic: b.mnemonic }));
    await this.bindings.replace(wellId, rows, { assetId, userId: user.id, action: 'replace', entity: 'curve_bindings', entityId: wellId, before: auditView(before), after });
    return this.effective(wellId);
  }

  /** Every curve of every run of the well except the index curves, runs in upload order. */
  private async curvesOf(wellId: string): Promise<WellCurve[]> {
    const runs = await this.wellRows.logRunsOf([wellId]);
    const curves = await this.wellRows.curvesOf(runs.map((r) => r.id));
    return runs.flatMap((r) =>
      curves
        .filter((c) => c.logRunId === r.id && c.position > 0)
        .sort((a, b) => a.position - b.position)
        .map((c) => ({ logRunId: r.id, fileName: r.fileName, mnemonic: c.mnemonic, unit: c.unit, curveClass: c.curveClass, valueCount: r.rowCount - c.nullCount, unitFits: unitFits(c.unit, c.curveClass) })),
    );
  }
}
