import { useLocalSearchParams } from 'expo-router';
import { DipTubeDetailScreen } from '@/components/registry/dip-tube-detail-screen';

export default function DipTubeDetailRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <DipTubeDetailScreen id={id} />;
}
