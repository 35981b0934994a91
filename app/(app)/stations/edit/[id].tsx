import { useLocalSearchParams } from 'expo-router';
import { StationFormScreen } from '@/components/forms/station-form';

export default function EditStationRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <StationFormScreen id={id} />;
}
