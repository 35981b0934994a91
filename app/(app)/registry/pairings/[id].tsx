import { useLocalSearchParams } from 'expo-router';
import { PairingDetailScreen } from '@/components/pairings/pairing-detail-screen';

export default function PairingRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <PairingDetailScreen id={id} />;
}
