import { SignInScreen } from '@/components/auth/sign-in-screen';

export default SignInScreen;
