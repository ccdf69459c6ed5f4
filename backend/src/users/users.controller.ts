import { Body, Controller, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import type { UserDto } from '@tiermode/shared-types';
import type { AppAbility } from '../authorization/app-ability';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { CurrentAbility } from '../authorization/current.decorators';
import { UuidParam } from '../common/pipes/uuid-param.pipe';
import { CreateUserDto } from './dto/create-user.dto';
import { UpdateUserDto } from './dto/update-user.dto';
import { UsersService } from './users.service';
import { ApiContract } from '../openapi/api-contract.decorator';

/** People and licences: admins only. */
@Controller('users')
@CheckPolicies((ability) => ability.can('manage', 'User'))
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @ApiContract({ summary: 'People (admin)', returns: 'UserDto[]' })
  @Get()
  list(@CurrentAbility() ability: AppAbility): Promise<UserDto[]> {
    return this.users.list(ability);
  }

  @ApiContract({
    summary: 'Add a person; a set-password link is mailed',
    body: 'CreateUserRequest',
    returns: 'UserDto',
  })
  @Post()
  create(@CurrentAbility() ability: AppAbility, @Body() body: CreateUserDto): Promise<UserDto> {
    return this.users.create(ability, body);
  }

  @ApiContract({
    summary: 'Change a person: role, licence, active, password reset',
    body: 'UpdateUserRequest',
    returns: 'UserDto',
  })
  @Patch(':id')
  update(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
    @Body() body: UpdateUserDto,
  ): Promise<UserDto> {
    return this.users.update(ability, id, body);
  }

  @ApiContract({
    summary: 'Mail a person a new set-password link; earlier links stop working',
    returns: 'UserDto',
  })
  @Post(':id/set-password-link')
  @HttpCode(200)
  sendSetPasswordLink(
    @CurrentAbility() ability: AppAbility,
    @Param('id', UuidParam('id')) id: string,
  ): Promise<UserDto> {
    return this.users.sendSetPasswordLink(ability, id);
  }
}
