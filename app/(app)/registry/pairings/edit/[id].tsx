import { useLocalSearchParams } from 'expo-router';
import { PairingFormScreen } from '@/components/forms/pairing-form';

export default function EditPairingRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <PairingFormScreen id={id} />;
}
