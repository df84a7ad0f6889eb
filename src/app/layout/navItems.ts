import { CircleUser, GraduationCap, Hammer, LayoutGrid, Mail, MessagesSquare, Users, type LucideIcon } from 'lucide-react';
import type { Role } from '@/domain/contracts';

export interface NavItem {
  to: string;
  label: string;
  icon: LucideIcon;
}

const designs: NavItem = { to: '/designs', label: 'Designs', icon: LayoutGrid };
const people: NavItem = { to: '/people', label: 'People', icon: Users };
const workbench: NavItem = { to: '/workbench', label: 'Workbench', icon: Hammer };
const reviews: NavItem = { to: '/reviews', label: 'Reviews', icon: MessagesSquare };
const classes: NavItem = { to: '/classes', label: 'Classes', icon: GraduationCap };
const outbox: NavItem = { to: '/outbox', label: 'Outbox', icon: Mail };
const account: NavItem = { to: '/account', label: 'Account', icon: CircleUser };

/** The navigation each role sees; pages outside its list answer "not available" as well. */
export const NAV_ITEMS_BY_ROLE: Record<Role, readonly NavItem[]> = {
  owner: [designs, people, outbox, account],
  designer: [designs, account],
  builder: [workbench, account],
  customer: [reviews, account],
  instructor: [classes, account],
};
