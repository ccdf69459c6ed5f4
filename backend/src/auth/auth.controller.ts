import { Body, Controller, Get, HttpCode, Ip, Post } from '@nestjs/common';
import type { LoginResponse, MeResponse } from '@tiermode/shared-types';
import type { AppAbility } from '../authorization/app-ability';
import { CheckPolicies } from '../authorization/check-policies.decorator';
import { CurrentAbility, CurrentUser } from '../authorization/current.decorators';
import { Public } from '../common/decorators/public.decorator';
import type { User } from '../users/user.entity';
import { AuthService } from './auth.service';
import { ChangePasswordDto } from './dto/change-password.dto';
import { LoginDto } from './dto/login.dto';
import { SetPasswordDto } from './dto/set-password.dto';
import { ApiContract } from '../openapi/api-contract.decorator';

/** Every signed-in user may read and manage its own session. */
const ownAccount = (ability: AppAbility) => ability.can('read', 'User');

@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @ApiContract({
    summary: 'Sign in with email and password',
    body: 'LoginRequest',
    returns: 'LoginResponse',
  })
  @Post('login')
  @HttpCode(200)
  login(@Body() body: LoginDto, @Ip() ip: string): Promise<LoginResponse> {
    return this.auth.login(body.email, body.password, ip);
  }

  @ApiContract({
    summary: 'The signed-in user and the CASL rules of its role',
    returns: 'MeResponse',
  })
  @Get('me')
  @CheckPolicies(ownAccount)
  me(@CurrentUser() user: User, @CurrentAbility() ability: AppAbility): MeResponse {
    return this.auth.me(user, ability);
  }

  @ApiContract({ summary: 'Sign out: every earlier token stops working', returns: null })
  @Post('logout')
  @HttpCode(204)
  @CheckPolicies(ownAccount)
  logout(@CurrentUser() user: User): Promise<void> {
    return this.auth.logout(user);
  }

  @ApiContract({
    summary: 'Change your password',
    body: 'ChangePasswordRequest',
    returns: 'LoginResponse',
  })
  @Post('password')
  @HttpCode(200)
  @CheckPolicies(ownAccount)
  changePassword(
    @CurrentUser() user: User,
    @Body() body: ChangePasswordDto,
    @Ip() ip: string,
  ): Promise<LoginResponse> {
    return this.auth.changePassword(user, body.currentPassword, body.newPassword, ip);
  }

  @Public()
  @ApiContract({
    summary: 'Set a password from a mailed one-time link',
    body: 'SetPasswordRequest',
    returns: null,
  })
  @Post('set-password')
  @HttpCode(204)
  setPassword(@Body() body: SetPasswordDto, @Ip() ip: string): Promise<void> {
    return this.auth.setPassword(body.token, body.password, ip);
  }
}
