import { HomeScreen } from '@/components/home/home-screen';

export default HomeScreen;
