import { Body, Controller, Get, Param, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  inspectionIntervalSchema,
  type FieldForm,
  type InspectionInterval,
  type PositionFieldHistory,
  type PositionFieldState,
  type PositionInterval,
} from '@holdfast/shared';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { Roles, SignedIn } from '../auth/policy.js';
import { ApiBodySchema } from '../common/openapi.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { FieldRecordsService } from './field-records.service.js';
import { InspectionScheduleService } from './inspection-schedule.service.js';

/** Field records seen from a brake position and from a revision's field card. */
@ApiTags('field-records')
@ApiBearerAuth()
@Controller()
export class PositionFieldController {
  constructor(
    private readonly records: FieldRecordsService,
    private readonly schedule: InspectionScheduleService,
  ) {}

  @Get('revisions/:revisionId/field-form')
  @SignedIn()
  form(
    @CurrentUser() user: AuthUser,
    @Param('revisionId', UuidParamPipe) revisionId: string,
  ): Promise<FieldForm> {
    return this.records.form(user, revisionId);
  }

  @Get('register/positions/:positionId/field-records')
  @SignedIn()
  async history(
    @Param('positionId', UuidParamPipe) positionId: string,
  ): Promise<PositionFieldHistory> {
    return { positionId, items: await this.records.history({ positionId }) };
  }

  @Get('register/positions/:positionId/field-state')
  @SignedIn()
  state(@Param('positionId', UuidParamPipe) positionId: string): Promise<PositionFieldState> {
    return this.schedule.state(positionId);
  }

  @Get('register/positions/:positionId/inspection-interval')
  @SignedIn()
  interval(@Param('positionId', UuidParamPipe) positionId: string): Promise<PositionInterval> {
    return this.schedule.getInterval(positionId);
  }

  @Put('register/positions/:positionId/inspection-interval')
  @Roles('engineer')
  @ApiBodySchema(inspectionIntervalSchema)
  setInterval(
    @CurrentUser() user: AuthUser,
    @Param('positionId', UuidParamPipe) positionId: string,
    @Body(new ZodValidationPipe(inspectionIntervalSchema)) input: InspectionInterval,
  ): Promise<PositionInterval> {
    return this.schedule.setInterval(user, positionId, input);
  }
}
