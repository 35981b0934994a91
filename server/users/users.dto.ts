import { IsBoolean, IsEmail, IsIn, IsOptional, IsString, MaxLength, MinLength } from 'class-validator';
import { ROLES, type Role } from '../../shared/roles';
import { THEME_CHOICES, type ThemeChoice } from '../../shared/themes';
import { MAIL_KINDS } from '../mail/outbox';

export class CreateUserDto {
  @IsEmail({}, { message: 'must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @IsString({ message: 'must be text' })
  @MinLength(1, { message: 'is required' })
  @MaxLength(120, { message: 'must be at most 120 characters' })
  name: string;

  @IsIn(ROLES, { message: `must be one of ${ROLES.join(', ')}` })
  role: Role;

  @IsString({ message: 'must be text' })
  temporaryPassword: string;
}

export class UpdateUserDto {
  @IsOptional()
  @IsIn(ROLES, { message: `must be one of ${ROLES.join(', ')}` })
  role?: Role;

  @IsOptional()
  @IsBoolean({ message: 'must be true or false' })
  active?: boolean;

  @IsOptional()
  @IsString({ message: 'must be text' })
  @MinLength(1, { message: 'is required' })
  @MaxLength(120, { message: 'must be at most 120 characters' })
  name?: string;
}

export class UpdateMeDto {
  @IsOptional()
  @IsIn(['mm', 'in'], { message: 'must be mm or in' })
  lengthUnit?: 'mm' | 'in';

  /** Kinds of notice not wanted by e-mail. */
  @IsOptional()
  @IsIn(MAIL_KINDS, { each: true, message: `must list kinds among ${MAIL_KINDS.join(', ')}` })
  mailOff?: string[];

  @IsOptional()
  @IsIn(THEME_CHOICES, { message: `must be one of ${THEME_CHOICES.join(', ')}` })
  theme?: ThemeChoice;
}
