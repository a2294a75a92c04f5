import {
  BookOpen,
  Calculator,
  ChartLine,
  ClipboardList,
  Flame,
  Images,
  Inbox,
  Library,
  ListChecks,
  Settings,
  ShieldAlert,
  Thermometer,
  Users,
  Wrench,
} from 'lucide-react';
import type { CurrentUser } from '#shared/auth/auth-schemas.ts';
import { can } from '#shared/auth/permissions.ts';
import type { Workshop } from '#shared/workshops/workshop-schemas.ts';
import type { NavItem } from '#src/components/layouts/app-shell.tsx';
import { paths } from '#src/config/paths.ts';

/**
 * The navigation, in DESIGN.md's order. Workshop places need a workshop;
 * Members shows only to those who may manage members there (the server
 * still decides).
 */
export function buildNavItems(workshop: Workshop | null, user: CurrentUser): NavItem[] {
  const items: NavItem[] = [];
  if (workshop) {
    const id = workshop.id;
    items.push(
      { id: 'heats', label: 'Heats', href: paths.heats.getHref(id), icon: Flame, placement: 'primary' },
      { id: 'gallery', label: 'Gallery', href: paths.gallery.getHref(id), icon: Images, placement: 'primary' },
      { id: 'reports', label: 'Reports', href: paths.reports.getHref(id), icon: ClipboardList, placement: 'primary' },
      { id: 'guide', label: 'Guide', href: paths.guide.getHref(id), icon: BookOpen, placement: 'primary' },
      { id: 'equipment', label: 'Equipment', href: paths.equipment.getHref(id), icon: Wrench, placement: 'more' },
      { id: 'calculators', label: 'Calculators', href: paths.calculators.getHref(id), icon: Calculator, placement: 'more' },
      { id: 'alloys', label: 'Alloy library', href: paths.alloys.getHref(id), icon: Library, placement: 'more' },
      { id: 'insights', label: 'Insights', href: paths.insights.getHref(id), icon: ChartLine, placement: 'more' },
      { id: 'heat-treatment', label: 'Heat treatment', href: paths.heatTreatment.getHref(id), icon: Thermometer, placement: 'more' },
    );
  }
  items.push(
    { id: 'safety', label: 'Safety', href: paths.safety.getHref(), icon: ShieldAlert, placement: 'more' },
    { id: 'settings', label: 'Settings', href: paths.settings.getHref(), icon: Settings, placement: 'more' },
  );
  // The review queue and the workshop's rules are mentors' and admins' work.
  if (workshop && (workshop.role === 'mentor' || workshop.role === 'admin')) {
    items.push(
      { id: 'review', label: 'Review queue', href: paths.review.getHref(workshop.id), icon: Inbox, placement: 'more' },
      { id: 'rules', label: 'Rules', href: paths.rules.getHref(workshop.id), icon: ListChecks, placement: 'more' },
    );
  }
  if (workshop && can({ id: user.id, role: workshop.role }, 'manage', 'member')) {
    items.push({ id: 'members', label: 'Members', href: paths.members.getHref(workshop.id), icon: Users, placement: 'more' });
  }
  return items;
}
