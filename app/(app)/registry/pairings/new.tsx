import { useLocalSearchParams } from 'expo-router';
import { PairingFormScreen } from '@/components/forms/pairing-form';

/** ?dipTubeId= or ?connectorId= start the pairing with that part picked (links from tube and head pages). */
export default function NewPairingRoute() {
  const { dipTubeId, connectorId } = useLocalSearchParams<{ dipTubeId?: string; connectorId?: string }>();
  return <PairingFormScreen initialDipTubeId={dipTubeId} initialConnectorId={connectorId} />;
}
