import { ImportScreen } from '@/components/imports/import-screen';

export default ImportScreen;
