import { WarningsScreen } from '@/components/sourcing/warnings-screen';

export default WarningsScreen;
