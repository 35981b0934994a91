import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';

export class SignInDto {
  @IsEmail({}, { message: 'must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @IsString({ message: 'must be text' })
  @MinLength(1, { message: 'is required' })
  @MaxLength(200)
  password: string;
}
