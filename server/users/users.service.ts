import type { DataSource } from 'typeorm';
import { conflict, fieldError, notFound } from '../common/errors';
import { User } from '../entities';
import { hashPassword } from '../auth/passwords';
import { passwordProblem } from '../../shared/passwords';
import type { UserRecord } from '../../shared/contract/users';
import { toUserRecord } from '../auth/auth.service';
import { audit } from '../audit/audit';
import type { CreateUserDto, UpdateMeDto, UpdateUserDto } from './users.dto';

export class UsersService {
  constructor(private readonly ds: DataSource) {}

  async list(): Promise<UserRecord[]> {
    const users = await this.ds.getRepository(User).find({ order: { role: 'ASC', email: 'ASC' } });
    return users.map(toUserRecord);
  }

  async create(dto: CreateUserDto, actingUserId: string): Promise<UserRecord> {
    const problem = passwordProblem(dto.temporaryPassword);
    if (problem) throw fieldError('temporaryPassword', problem);
    const email = dto.email.trim().toLowerCase();
    const repo = this.ds.getRepository(User);
    if (await repo.existsBy({ email })) throw conflict(`A user with the e-mail ${email} already exists.`, [{ field: 'email', messages: ['is already in use'] }]);
    const user = repo.create({
      email,
      displayName: dto.name.trim(),
      role: dto.role,
      passwordHash: await hashPassword(dto.temporaryPassword),
      active: true,
      mustChangePassword: true,
    });
    return this.ds.transaction(async (m) => {
      const saved = await m.save(user);
      await audit(m, { userId: actingUserId, action: 'create', entity: 'users', entityId: saved.id, summary: `Person added: ${saved.email} as ${saved.role}`, after: toUserRecord(saved) });
      return toUserRecord(saved);
    });
  }

  async update(id: string, dto: UpdateUserDto, actingUserId: string): Promise<UserRecord> {
    const repo = this.ds.getRepository(User);
    const user = await repo.findOneBy({ id });
    if (!user) throw notFound('User');
    if (id === actingUserId && (dto.active === false || (dto.role && dto.role !== 'admin'))) {
      throw fieldError(dto.active === false ? 'active' : 'role', 'you cannot deactivate yourself or remove your own administrator role');
    }
    const before = toUserRecord(user);
    if (dto.role) user.role = dto.role;
    if (dto.active !== undefined) user.active = dto.active;
    if (dto.name) user.displayName = dto.name.trim();
    return this.ds.transaction(async (m) => {
      const saved = toUserRecord(await m.save(user));
      await audit(m, { userId: actingUserId, action: 'update', entity: 'users', entityId: id, summary: `Person changed: ${saved.email}`, before, after: saved });
      return saved;
    });
  }

  /** The signed-in person's own preferences: length unit, which kinds of mail they want, colour theme. */
  async updateMe(id: string, dto: UpdateMeDto): Promise<UserRecord> {
    const repo = this.ds.getRepository(User);
    const user = await repo.findOneByOrFail({ id });
    if (dto.lengthUnit) user.lengthUnit = dto.lengthUnit;
    if (dto.mailOff) user.mailOff = [...new Set(dto.mailOff)];
    if (dto.theme) user.theme = dto.theme;
    return toUserRecord(await repo.save(user));
  }
}
