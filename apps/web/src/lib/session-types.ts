import type { Role } from './roles';

// The signed-in user as the API returns it from sign-in, registration, invitation and /auth/me.
// (Shared request and response types move to packages/domain once it exports them.)
export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  companyId: string;
  companyName: string;
}

export interface AuthResponse {
  accessToken: string;
  user: SessionUser;
}
