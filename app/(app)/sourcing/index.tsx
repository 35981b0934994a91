import { PlansScreen } from '@/components/sourcing/plans-screen';

export default PlansScreen;
