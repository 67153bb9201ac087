// The sign-in card: mark, name, pitch, and the button that starts the identity provider's flow.
import { AnchorButton, Card, Spinner } from '@blueprintjs/core';
import { loginUrl } from '../../../routes.js';
import { HexloomLogo } from '../../brand/components/HexloomLogo.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useAuthProvider } from '../api/useAuthProvider.js';

/** Sign-in card; the button is a plain link to /api/auth/login (a full-page navigation). */
export function SignInCard({ returnTo }: { returnTo: string }) {
  const provider = useAuthProvider();
  const isGithub = provider.data?.provider === 'github';
  return (
    <Card className="hx-signin-card" elevation={2}>
      <HexloomLogo sizePx={72} title="Hexloom logo" />
      <h1>Hexloom</h1>
      <p className="hx-pitch">
        Program recirculating hexagonal waveguide meshes: describe the chip, state the RF filter or delay you need,
        and let Hexloom synthesise, route and simulate it.
      </p>
      {provider.isPending ? (
        <Spinner size={24} />
      ) : (
        <>
          <AnchorButton
            href={loginUrl(returnTo)}
            intent="primary"
            size="large"
            fill
            icon={isGithub ? 'git-repo' : 'log-in'}
            text={isGithub ? 'Sign in with GitHub' : 'Sign in'}
            data-testid="signin-button"
          />
          {provider.data?.provider === 'local' ? (
            <p className="hx-muted" style={{ marginTop: 12, fontSize: 13 }} data-testid="local-idp-note">
              local identity provider (development)
            </p>
          ) : null}
          <div style={{ marginTop: provider.isError ? 16 : 0, textAlign: 'left' }}>
            <ApiErrorCallout error={provider.error} title="Could not ask the server how to sign in" />
          </div>
        </>
      )}
    </Card>
  );
}
