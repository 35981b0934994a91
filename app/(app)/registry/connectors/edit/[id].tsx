import { useLocalSearchParams } from 'expo-router';
import { ConnectorFormScreen } from '@/components/forms/connector-form';

export default function EditConnectorRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <ConnectorFormScreen id={id} />;
}
