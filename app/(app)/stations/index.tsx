import { StationsScreen } from '@/components/stations/stations-screen';

export default StationsScreen;
