import { StationFormScreen } from '@/components/forms/station-form';

export default function NewStationRoute() {
  return <StationFormScreen />;
}
