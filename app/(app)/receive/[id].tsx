import { useLocalSearchParams } from 'expo-router';
import { LotScreen } from '@/components/receive/lot-screen';

export default function LotRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <LotScreen id={id} />;
}
