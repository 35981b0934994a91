import { ThreadScreen } from '@/components/tools/thread-screen';

export default ThreadScreen;
