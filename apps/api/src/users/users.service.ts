import { ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, EntityManager } from 'typeorm';
import { newToken } from '../auth/password';
import type { AuthUser } from '../common/current-user';
import { ENV, Env } from '../config/env';
import { CompaniesService } from '../companies/companies.service';
import { MailService } from '../mail/mail.service';
import { EstimatorResponse, InviteUserDto, UpdateUserDto, UserResponse } from './dto/user.dto';
import { User } from './entities/user.entity';

const INVITATION_DAYS = 7;

@Injectable()
export class UsersService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly companies: CompaniesService,
    private readonly mail: MailService,
    @Inject(ENV) private readonly env: Env,
  ) {}

  private async withPasswordFlag(manager: EntityManager, users: User[]): Promise<UserResponse[]> {
    if (users.length === 0) {
      return [];
    }
    const rows: { id: string }[] = await manager.query(
      `SELECT id FROM users WHERE id = ANY($1) AND password_hash IS NOT NULL`,
      [users.map((u) => u.id)],
    );
    const withPw = new Set(rows.map((r) => r.id));
    return users.map((u) => UserResponse.from(u, withPw.has(u.id)));
  }

  async list(companyId: string): Promise<UserResponse[]> {
    const users = await this.db.getRepository(User).find({ where: { companyId }, order: { name: 'ASC' } });
    return this.withPasswordFlag(this.db.manager, users);
  }

  /** Active owners and estimators (the people jobs.service accepts as a job's estimator), by name. */
  async estimators(companyId: string): Promise<EstimatorResponse[]> {
    const rows: EstimatorResponse[] = await this.db.query(
      `SELECT id, name, role FROM users
        WHERE company_id = $1 AND active AND role IN ('owner', 'estimator')
        ORDER BY lower(name), id`,
      [companyId],
    );
    return rows.map((r) => ({ id: r.id, name: r.name, role: r.role }));
  }

  async invite(actor: AuthUser, dto: InviteUserDto): Promise<UserResponse> {
    const { token, hash } = newToken();
    const company = await this.companies.get(actor.companyId);
    const { saved, mailId } = await this.db.transaction(async (m) => {
      const taken = await m.query(`SELECT 1 FROM users WHERE lower(email) = $1`, [dto.email]);
      if (taken.length > 0) {
        throw new ConflictException(`${dto.email} already has a Potlife sign-in`);
      }
      const user = m.getRepository(User).create({
        companyId: actor.companyId,
        email: dto.email,
        name: dto.name,
        role: dto.role,
        active: true,
        passwordHash: null,
        invitationTokenHash: hash,
        invitationExpiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
      });
      const row = await m.getRepository(User).save(user);
      const link = `${this.env.PUBLIC_URL}/invitation/${token}`;
      const mailId = await this.mail.record(m, {
        companyId: actor.companyId,
        to: dto.email,
        subject: `${actor.name} invited you to ${company.name} on Potlife`,
        text: [
          `Hello ${dto.name},`,
          '',
          `${actor.name} has invited you to join ${company.name} on Potlife as ${dto.role === 'owner' || dto.role === 'estimator' ? 'an' : 'a'} ${dto.role}.`,
          `Set your password with this one-time link (valid for ${INVITATION_DAYS} days):`,
          link,
          '',
          'If you did not expect this, ignore this message.',
        ].join('\n'),
      });
      return { saved: row, mailId };
    });
    await this.mail.dispatch(mailId);
    return UserResponse.from(saved, false);
  }

  async update(actor: AuthUser, id: string, dto: UpdateUserDto): Promise<UserResponse> {
    return this.db.transaction(async (m) => {
      // Lock the company's owners so two owners demoting each other at once cannot leave none.
      await m.query(`SELECT id FROM users WHERE company_id = $1 AND role = 'owner' FOR UPDATE`, [actor.companyId]);
      const user = await m.getRepository(User).findOneBy({ id, companyId: actor.companyId });
      if (!user) {
        throw new NotFoundException('User not found');
      }
      if (dto.role !== undefined) {
        user.role = dto.role;
      }
      if (dto.active !== undefined) {
        user.active = dto.active;
      }
      await m.getRepository(User).save(user);
      const [{ owners }] = (await m.query(
        `SELECT count(*)::int AS owners FROM users WHERE company_id = $1 AND role = 'owner' AND active AND password_hash IS NOT NULL`,
        [actor.companyId],
      )) as [{ owners: number }];
      if (owners < 1) {
        throw new ConflictException('A company must keep at least one active owner: make someone else an owner first');
      }
      const [resp] = await this.withPasswordFlag(m, [user]);
      return resp!;
    });
  }
}
