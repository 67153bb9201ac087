/** /api/auth routes: provider kind, login redirect, OAuth callback, logout. */
import { SkipThrottle } from '@nestjs/throttler';
import { COMPUTE_THROTTLER, UserOrAddressThrottlerGuard } from '../common/rate-limit.js';
import { Controller, Get, HttpCode, Inject, Post, Query, Req, Res, UseGuards } from '@nestjs/common';
import { ApiBadRequestResponse, ApiFoundResponse, ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiQuery, ApiTags } from '@nestjs/swagger';
import { type AuthProviders, authProvidersSchema, type User } from '@hexloom/contracts';
import type { Response } from 'express';
import type { AuthedRequest } from '../common/authed-request.js';
import { HEXLOOM_OPTIONS, type ResolvedOptions } from '../common/hexloom-options.js';
import { openApiSchema } from '../common/openapi-schema.js';
import { Public } from '../common/public.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { type LoginQuery, loginQuerySchema, type OAuthStateCookie } from './auth.schemas.js';
import { AuthService } from './auth.service.js';
import { IdpCallbackGuard } from './idp-callback.guard.js';
import { OAuthStateGuard } from './oauth-state.guard.js';
import { clearingOptions, OAUTH_STATE_COOKIE, oauthStateCookieOptions, SESSION_COOKIE, sessionCookieOptions } from './session-cookie.js';

/** Public sign-in routes; the session cookie is set only by the callback. */
@ApiTags('auth')
@Public()
@UseGuards(UserOrAddressThrottlerGuard)
@SkipThrottle({ [COMPUTE_THROTTLER]: true })
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    @Inject(HEXLOOM_OPTIONS) private readonly options: ResolvedOptions,
  ) {}

  @Get('providers')
  @ApiOperation({ summary: "Which identity provider signs people in ('local' = the built-in fake one)" })
  @ApiOkResponse({ schema: openApiSchema(authProvidersSchema) })
  providers(): AuthProviders {
    return { provider: this.auth.providerKind() };
  }

  @Get('login')
  @ApiOperation({ summary: "302 to the provider's authorize page (full-page navigation)" })
  @ApiQuery({ name: 'returnTo', required: false, description: 'Path on this site to return to, default /' })
  @ApiQuery({ name: 'invitation', required: false, description: 'Token of the invitation link the sign-in accepts' })
  @ApiFoundResponse({ description: 'Redirect to the identity provider' })
  login(@Query(new ZodValidationPipe(loginQuerySchema)) query: LoginQuery, @Res() res: Response): void {
    const state = this.auth.newState();
    const cookie: OAuthStateCookie = { state, returnTo: query.returnTo ?? '/', ...(query.invitation ? { invitation: query.invitation } : {}) };
    res.cookie(OAUTH_STATE_COOKIE, cookie, oauthStateCookieOptions(this.options.cookieSecure));
    res.redirect(302, this.auth.authorizeUrl(state));
  }

  @Get('callback')
  @UseGuards(OAuthStateGuard, IdpCallbackGuard)
  @ApiOperation({ summary: 'Provider callback: check state, exchange code, open a session, 302 to returnTo' })
  @ApiQuery({ name: 'code', required: true })
  @ApiQuery({ name: 'state', required: true })
  @ApiFoundResponse({ description: 'Signed in; redirect to returnTo' })
  @ApiBadRequestResponse({ description: 'State mismatch, or a bad, reused or expired code' })
  async callback(@Req() req: AuthedRequest, @Res() res: Response): Promise<void> {
    const user = req.user as User;
    const token = await this.auth.completeSignIn(user, req.oauthInvitation);
    res.clearCookie(OAUTH_STATE_COOKIE, clearingOptions(oauthStateCookieOptions(this.options.cookieSecure)));
    res.cookie(SESSION_COOKIE, token, sessionCookieOptions(this.options.cookieSecure));
    res.redirect(302, req.oauthReturnTo ?? '/');
  }

  @Post('logout')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete the session and clear the cookie (204 even when not signed in)' })
  @ApiNoContentResponse({ description: 'Signed out' })
  async logout(@Req() req: AuthedRequest, @Res({ passthrough: true }) res: Response): Promise<void> {
    const token: unknown = req.signedCookies?.[SESSION_COOKIE];
    await this.auth.signOut(typeof token === 'string' ? token : undefined);
    res.clearCookie(SESSION_COOKIE, clearingOptions(sessionCookieOptions(this.options.cookieSecure)));
  }
}
