import { BindingsModule } from '../bindings/bindings.module.js';
import { CurveCheckModule } from '../curve-check/curve-check.module.js';
import { CutoffsModule } from '../cutoffs/cutoffs.module.js';
import { ExportsModule } from '../exports/exports.module.js';
import { FormationsModule } from '../formations/formations.module.js';
import { InterpretationsModule } from '../interpretations/interpretations.module.js';
import { MembersModule } from '../members/members.module.js';
import { SurveysModule } from '../surveys/surveys.module.js';
import { TopsModule } from '../tops/tops.module.js';
import { ZoneParametersModule } from '../zone-parameters/zone-parameters.module.js';
import { ZoneTablesModule } from '../zone-tables/zone-tables.module.js';
import { WorkbenchModule } from './workbench.module.js';

/** The well workbench feature modules (asset members, formations to interpretations and exports), registered by AppModule. */
export const WORKBENCH_MODULES = [
  MembersModule,
  FormationsModule,
  CutoffsModule,
  TopsModule,
  BindingsModule,
  CurveCheckModule,
  SurveysModule,
  ZoneParametersModule,
  WorkbenchModule,
  InterpretationsModule,
  ZoneTablesModule,
  ExportsModule,
];
