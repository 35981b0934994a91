import { useLocalSearchParams } from 'expo-router';
import { ConnectorDetailScreen } from '@/components/registry/connector-detail-screen';

export default function ConnectorDetailRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <ConnectorDetailScreen id={id} />;
}
