import { FlowScreen } from '@/components/tools/flow-screen';

export default FlowScreen;
