// /signin: the public entry page.
import { useSearchParams } from 'react-router-dom';
import { safeReturnTo } from '../routes.js';
import { SignInCard } from '../modules/auth/components/SignInCard.js';
import { ThemeToggle } from '../modules/theme/components/ThemeToggle.js';
import { useDocumentTitle } from '../modules/core/hooks/useDocumentTitle.js';

/** Sign-in page; ?returnTo= names where to come back after signing in. */
export function SignInPage() {
  useDocumentTitle('Sign in');
  const [params] = useSearchParams();
  return (
    <main className="hx-signin">
      <div className="hx-signin-theme">
        <ThemeToggle />
      </div>
      <SignInCard returnTo={safeReturnTo(params.get('returnTo'))} />
    </main>
  );
}
