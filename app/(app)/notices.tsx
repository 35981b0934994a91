import { NoticesScreen } from '@/components/notifications/notices-screen';

export default NoticesScreen;
