import { useLocalSearchParams } from 'expo-router';
import { DrumTypeFormScreen } from '@/components/forms/drum-type-form';

export default function EditDrumTypeRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <DrumTypeFormScreen id={id} />;
}
