import { useLocalSearchParams } from 'expo-router';
import { SlurryDetailScreen } from '@/components/registry/slurry-detail-screen';

export default function SlurryDetailRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <SlurryDetailScreen id={id} />;
}
