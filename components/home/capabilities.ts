import type { Role } from '@/shared/contract/roles';

export interface Capability {
  title: string;
  text: string;
}

/** What each role does in Bungwise, shown on its home page. */
export const CAPABILITIES: Record<Role, Capability[]> = {
  clerk: [
    { title: 'Check an incoming lot', text: 'Pick or describe the drum and get fits, caution or no fit, with the reasons and the tube and head to use.' },
    { title: 'Hold a lot', text: 'Put a lot that does not fit on hold with a reason; engineers and buyers are told.' },
    { title: 'Rotate tube sets', text: 'Record change-outs and the DI-water rinse of each tube set.' },
  ],
  engineer: [
    { title: 'Keep the registry', text: 'Register drum types with their openings, dip tubes, dispense heads and key codes.' },
    { title: 'Approve pairings', text: "Review another engineer's tube and head pairing and approve or reject it." },
    { title: 'Import spec sheets', text: "Load suppliers' CSV spec sheets after a dry run." },
  ],
  buyer: [
    { title: 'Plan a new source', text: 'See which stations a drum from a new supplier or region would reach, and what hardware to order.' },
    { title: 'Follow hardware warnings', text: 'Acknowledge and close warnings raised by plans and held lots.' },
  ],
  admin: [
    { title: 'Manage people', text: 'Add people with a temporary password, change roles, deactivate accounts.' },
    { title: 'Everything engineers do', text: 'Registry, pairings and imports are open to administrators too.' },
  ],
};
