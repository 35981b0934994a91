import { HistoryScreen } from '@/components/receive/history-screen';

export default HistoryScreen;
