import { UsersScreen } from '@/components/admin/users-screen';

export default UsersScreen;
