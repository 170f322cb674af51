import { ApiProperty } from '@nestjs/swagger';
import { IsObject } from 'class-validator';

export class ZoneParametersDto {
  @ApiProperty({ type: 'object', additionalProperties: true, description: "core's ZoneParameters (method choices and parameters of the zone)" })
  params: Record<string, unknown>;
  @ApiProperty({ description: "True when nothing is stored and these are the defaults of the formation's lithology" }) isDefault: boolean;
}

export class PutZoneParametersDto {
  @ApiProperty({ type: 'object', additionalProperties: true, description: "The full ZoneParameters object (see GET for the shape)" })
  @IsObject({ message: 'params must be an object of zone parameters' })
  params: Record<string, unknown>;
}
