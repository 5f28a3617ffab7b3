import type { Role } from '@holdfast/shared';

/** Access tokens live 15 minutes; the refresh cookie renews them. */
export const ACCESS_TOKEN_SECONDS = 15 * 60;

/** Claims of a Holdfast access token (HS256). */
export interface AccessTokenClaims {
  sub: string;
  role: Role;
  name: string;
  /** The user's session version when issued; sign-out and password changes raise it. */
  sv: number;
  /** Set by the signer; a token without it is refused. */
  exp?: number;
}

export const REFRESH_COOKIE = 'hf_refresh';
export const REFRESH_COOKIE_PATH = '/api/auth';
