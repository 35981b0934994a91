import { useLocalSearchParams } from 'expo-router';
import { DrumTypeDetailScreen } from '@/components/registry/drum-type-detail-screen';

export default function DrumTypeDetailRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <DrumTypeDetailScreen id={id} />;
}
