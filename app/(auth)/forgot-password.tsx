import { ForgotPasswordScreen } from '@/components/auth/forgot-password-screen';

export default ForgotPasswordScreen;
