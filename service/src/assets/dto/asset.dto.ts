import { ApiProperty } from '@nestjs/swagger';
import { ROLES } from '../../auth/auth-user.js';

export class AssetDto {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty() description: string;
  @ApiProperty({ enum: ROLES, description: "The caller's role in this asset" }) role: (typeof ROLES)[number];
  @ApiProperty({ description: 'The invented demo asset (it has a model-vs-evaluated check)' }) isDemo: boolean;
}
