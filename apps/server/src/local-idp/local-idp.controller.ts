/** HTTP endpoints of the fake identity provider, shaped like a code host's OAuth web flow. */
import { SkipThrottle } from '@nestjs/throttler';
import { COMPUTE_THROTTLER, UserOrAddressThrottlerGuard } from '../common/rate-limit.js';
import { Body, Controller, Get, Header, Headers, HttpCode, Post, Query, Redirect, UnauthorizedException, UseGuards } from '@nestjs/common';
import { ApiBody, ApiOkResponse, ApiOperation, ApiProduces, ApiTags } from '@nestjs/swagger';
import { z } from 'zod';
import { openApiSchema } from '../common/openapi-schema.js';
import { Public } from '../common/public.decorator.js';
import { ZodValidationPipe } from '../common/zod-validation.pipe.js';
import { DEMO_ACCOUNTS } from '../db/demo-accounts.js';
import {
  type AccessTokenBody,
  accessTokenBodySchema,
  type AuthorizeForm,
  authorizeFormSchema,
  type AuthorizeQuery,
  authorizeQuerySchema,
} from './local-idp.schemas.js';
import type { LocalIdpProfile } from './local-idp-profile.js';
import { LocalIdpService } from './local-idp.service.js';
import { renderAuthorizePage } from './render-authorize-page.js';

const profileSchema = z.object({
  id: z.string(),
  login: z.string(),
  name: z.string(),
  email: z.string().nullable(),
  avatar_url: z.string().nullable(),
});

/** Used only when no GitHub credentials are configured. */
@ApiTags('local identity provider')
@Public()
@UseGuards(UserOrAddressThrottlerGuard)
@SkipThrottle({ [COMPUTE_THROTTLER]: true })
@Controller('local-idp')
export class LocalIdpController {
  constructor(private readonly idp: LocalIdpService) {}

  @Get('authorize')
  @Header('Content-Type', 'text/html; charset=utf-8')
  @Header('Cache-Control', 'no-store')
  @ApiOperation({ summary: 'Sign-in page listing the demo accounts and a form for any other account' })
  @ApiProduces('text/html')
  authorizePage(@Query(new ZodValidationPipe(authorizeQuerySchema)) query: AuthorizeQuery): string {
    this.idp.assertClient(query.client_id, query.redirect_uri);
    return renderAuthorizePage(query, DEMO_ACCOUNTS);
  }

  @Post('authorize')
  @Redirect()
  @ApiOperation({ summary: 'Sign in as the chosen account; 302 to redirect_uri with code and state' })
  @ApiBody({ schema: openApiSchema(authorizeFormSchema, 'input') })
  authorize(@Body(new ZodValidationPipe(authorizeFormSchema)) form: AuthorizeForm): { url: string; statusCode: number } {
    const code = this.idp.issueCode({ login: form.login, name: form.name, email: form.email }, form.client_id, form.redirect_uri);
    const url = new URL(form.redirect_uri);
    url.searchParams.set('code', code);
    url.searchParams.set('state', form.state);
    return { url: url.toString(), statusCode: 302 };
  }

  @Post('access_token')
  @HttpCode(200)
  @ApiOperation({ summary: 'Exchange a single-use code (valid 10 minutes) for a bearer token' })
  @ApiBody({ schema: openApiSchema(accessTokenBodySchema, 'input') })
  @ApiOkResponse({ schema: openApiSchema(z.object({ access_token: z.string(), token_type: z.literal('bearer'), scope: z.string() })) })
  accessToken(@Body(new ZodValidationPipe(accessTokenBodySchema)) body: AccessTokenBody): {
    access_token: string;
    token_type: 'bearer';
    scope: string;
  } {
    const token = this.idp.exchangeCode(body.code, body.client_id, body.redirect_uri);
    return { access_token: token, token_type: 'bearer', scope: 'read:user user:email' };
  }

  @Get('user')
  @ApiOperation({ summary: 'The account behind `Authorization: Bearer <token>`' })
  @ApiOkResponse({ schema: openApiSchema(profileSchema) })
  user(@Headers('authorization') authorization: string | undefined): LocalIdpProfile {
    const match = /^Bearer\s+(\S+)$/i.exec(authorization ?? '');
    if (!match?.[1]) throw new UnauthorizedException('Expected "Authorization: Bearer <token>"');
    return this.idp.userForToken(match[1]);
  }
}
