import { ConflictException, Injectable, NotFoundException, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { CompaniesService } from '../companies/companies.service';
import { Company } from '../companies/entities/company.entity';
import { User } from '../users/entities/user.entity';
import { InvitationResponse, LoginDto, RegisterDto, SessionResponse, SessionUser } from './dto/auth.dto';
import { LoginThrottleService } from './login-throttle.service';
import { hashPassword, hashToken, verifyPassword } from './password';

const WRONG = 'That e-mail address and password do not match a Potlife sign-in';

@Injectable()
export class AuthService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly jwt: JwtService,
    private readonly companies: CompaniesService,
    private readonly throttle: LoginThrottleService,
  ) {}

  private async session(user: User): Promise<SessionResponse> {
    const company = await this.companies.get(user.companyId);
    const accessToken = await this.jwt.signAsync({ sub: user.id, cid: user.companyId, role: user.role });
    const sessionUser: SessionUser = {
      id: user.id,
      email: user.email,
      name: user.name,
      role: user.role,
      companyId: user.companyId,
      companyName: company.name,
    };
    return { accessToken, user: sessionUser };
  }

  async register(dto: RegisterDto): Promise<SessionResponse> {
    const passwordHash = await hashPassword(dto.password);
    const user = await this.db.transaction(async (m) => {
      const taken = await m.query(`SELECT 1 FROM users WHERE lower(email) = $1`, [dto.email]);
      if (taken.length > 0) {
        throw new ConflictException(`${dto.email} already has a Potlife sign-in; sign in instead`);
      }
      const company = await this.companies.create(m, dto.companyName);
      return m.getRepository(User).save(
        m.getRepository(User).create({
          companyId: company.id,
          email: dto.email,
          name: dto.name,
          role: 'owner',
          active: true,
          passwordHash,
        }),
      );
    });
    return this.session(user);
  }

  async login(dto: LoginDto, ip: string): Promise<SessionResponse> {
    await this.throttle.assertAllowed(dto.email, ip);
    const user = await this.db
      .getRepository(User)
      .createQueryBuilder('u')
      .addSelect('u.passwordHash')
      .where('lower(u.email) = :email', { email: dto.email })
      .getOne();
    const ok = await verifyPassword(dto.password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !ok || !user.passwordHash) {
      await this.throttle.recordFailure(dto.email, ip);
      throw new UnauthorizedException(WRONG);
    }
    if (!user.active) {
      throw new UnauthorizedException('This sign-in has been deactivated; ask your company’s owner');
    }
    await this.throttle.clear(dto.email, ip);
    return this.session(user);
  }

  async me(userId: string, companyId: string): Promise<SessionUser> {
    const user = await this.db.getRepository(User).findOneBy({ id: userId, companyId });
    if (!user) {
      throw new UnauthorizedException('Please sign in again');
    }
    return (await this.session(user)).user;
  }

  private async findInvited(token: string): Promise<User> {
    const user = await this.db
      .getRepository(User)
      .createQueryBuilder('u')
      .where('u.invitationTokenHash = :h', { h: hashToken(token) })
      .andWhere('u.invitationExpiresAt > now()')
      .andWhere('u.active')
      .getOne();
    if (!user) {
      throw new NotFoundException('This invitation link has been used or has expired; ask your owner for a new one');
    }
    return user;
  }

  async invitation(token: string): Promise<InvitationResponse> {
    const user = await this.findInvited(token);
    const company = await this.db.getRepository(Company).findOneByOrFail({ id: user.companyId });
    return { email: user.email, name: user.name, role: user.role, companyName: company.name };
  }

  async acceptInvitation(token: string, password: string): Promise<SessionResponse> {
    const user = await this.findInvited(token);
    const passwordHash = await hashPassword(password);
    const res = await this.db
      .createQueryBuilder()
      .update(User)
      .set({ passwordHash, invitationTokenHash: null, invitationExpiresAt: null })
      .where('id = :id AND invitation_token_hash = :h', { id: user.id, h: hashToken(token) })
      .execute();
    if (res.affected !== 1) {
      throw new NotFoundException('This invitation link has been used or has expired; ask your owner for a new one');
    }
    return this.session(user);
  }
}

// Verifying against a dummy hash when the address is unknown keeps the answer time the same.
const DUMMY_HASH = 'scrypt$32768$8$1$AAAAAAAAAAAAAAAAAAAAAA$AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA';
