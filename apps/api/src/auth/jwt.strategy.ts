import { Inject, Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { InjectDataSource } from '@nestjs/typeorm';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { DataSource } from 'typeorm';
import type { AuthUser } from '../common/current-user';
import { ENV, Env } from '../config/env';
import { User } from '../users/entities/user.entity';

interface TokenPayload {
  sub: string;
  cid: string;
}

/** Verifies the bearer token, then reloads the user: a deactivated user or changed role counts at once. */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy, 'jwt') {
  constructor(
    @Inject(ENV) env: Env,
    @InjectDataSource() private readonly db: DataSource,
  ) {
    super({ jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(), secretOrKey: env.JWT_SECRET, ignoreExpiration: false });
  }

  async validate(payload: TokenPayload): Promise<AuthUser | false> {
    const user = await this.db.getRepository(User).findOneBy({ id: payload.sub, companyId: payload.cid });
    if (!user || !user.active) {
      return false;
    }
    return { id: user.id, companyId: user.companyId, email: user.email, name: user.name, role: user.role };
  }
}
