import { can } from '@/shared/contract/roles';
import { AttachmentsPanel } from '../attachments/attachments-panel';
import { useSession } from '../session';

/** The files kept with a dock check: the dock adds them, everyone reads them. */
export function CheckFiles({ checkId }: { checkId: string }) {
  const { session } = useSession();
  return (
    <AttachmentsPanel
      ownerKind="receiving-check"
      ownerId={checkId}
      canAdd={can(session?.user.role, 'check-lots')}
      title="Files for this lot"
      hint="The delivery note and photos of the drum labels: PDF or photo, up to 10 MB each. The certificate of analysis goes through Attach the certificate, so the lot rules see it."
    />
  );
}
