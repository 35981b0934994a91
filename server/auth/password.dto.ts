import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';
import { MAX_PASSWORD_LENGTH } from '../../shared/passwords';

// The rule for a new password (shared/passwords.ts) is checked by the service, which names the field; these
// only make sure the fields are text of a sane size.
export class ChangePasswordDto {
  @IsString({ message: 'must be text' })
  @MinLength(1, { message: 'is required' })
  @MaxLength(MAX_PASSWORD_LENGTH, { message: `must be at most ${MAX_PASSWORD_LENGTH} characters` })
  currentPassword: string;

  @IsString({ message: 'must be text' })
  newPassword: string;
}

export class ForgotPasswordDto {
  @IsEmail({}, { message: 'must be an e-mail address' })
  @MaxLength(254)
  email: string;
}

export class ResetPasswordDto {
  // A reset token is 43 characters of base64url; anything far off is refused before a database look-up.
  @IsString({ message: 'must be text' })
  @MinLength(20, { message: 'is not a reset link token' })
  @MaxLength(100, { message: 'is not a reset link token' })
  token: string;

  @IsString({ message: 'must be text' })
  newPassword: string;
}
