import { ChangePasswordScreen } from '@/components/auth/change-password-screen';

export default ChangePasswordScreen;
