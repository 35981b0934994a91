import { ResetPasswordScreen } from '@/components/auth/reset-password-screen';

export default ResetPasswordScreen;
