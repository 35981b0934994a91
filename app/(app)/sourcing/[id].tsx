import { useLocalSearchParams } from 'expo-router';
import { PlanScreen } from '@/components/sourcing/plan-screen';

export default function PlanRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <PlanScreen id={id} />;
}
