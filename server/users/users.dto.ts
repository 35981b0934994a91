import { ArrayMaxSize, IsArray, IsBoolean, IsEmail, IsIn, IsString, MaxLength, MinLength } from 'class-validator';
import { Optional } from '../common/fields';
import { ROLES, type Role } from '../../shared/contract/roles';
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
  @Optional()
  @IsIn(ROLES, { message: `must be one of ${ROLES.join(', ')}` })
  role?: Role;

  @Optional()
  @IsBoolean({ message: 'must be true or false' })
  active?: boolean;

  @Optional()
  @IsString({ message: 'must be text' })
  @MinLength(1, { message: 'is required' })
  @MaxLength(120, { message: 'must be at most 120 characters' })
  name?: string;
}

export class UpdateMeDto {
  @Optional()
  @IsIn(['mm', 'in'], { message: 'must be mm or in' })
  lengthUnit?: 'mm' | 'in';

  /** Kinds of notice not wanted by e-mail. */
  // IsIn with each: true also passes a single string that is one of the kinds ("lot-held"), which would
  // then be stored letter by letter: the list itself is checked first.
  @Optional()
  @IsArray({ message: `must be a list of kinds among ${MAIL_KINDS.join(', ')}` })
  @ArrayMaxSize(MAIL_KINDS.length * 2, { message: `must list at most ${MAIL_KINDS.length * 2} kinds` })
  @IsIn(MAIL_KINDS, { each: true, message: `must list kinds among ${MAIL_KINDS.join(', ')}` })
  mailOff?: string[];

  @Optional()
  @IsIn(THEME_CHOICES, { message: `must be one of ${THEME_CHOICES.join(', ')}` })
  theme?: ThemeChoice;
}
