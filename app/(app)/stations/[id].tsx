import { useLocalSearchParams } from 'expo-router';
import { StationBoardScreen } from '@/components/stations/station-board-screen';

export default function StationBoardRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <StationBoardScreen id={id} />;
}
