import {
  BarChart3,
  Bell,
  BookOpen,
  CalendarDays,
  ClipboardCheck,
  Cylinder,
  Fish,
  LayoutGrid,
  Repeat,
  Users,
  CalendarClock,
  Mail,
  Settings,
  Printer,
  Siren,
  type LucideIcon,
} from 'lucide-react'
import type { Role } from '#shared/schemas/person'

export interface NavItem {
  to: string
  label: string
  icon: LucideIcon
  roles: readonly Role[]
  /** Shown in the phone's bottom bar; the rest sit under "More". */
  primary?: boolean
}

const everyone = ['manager', 'supervisor', 'technician', 'observer'] as const

export const NAV_ITEMS: NavItem[] = [
  { to: '/round', label: 'Round', icon: ClipboardCheck, roles: ['manager', 'supervisor', 'technician'], primary: true },
  { to: '/board', label: 'Board', icon: LayoutGrid, roles: everyone, primary: true },
  { to: '/calendar', label: 'Calendar', icon: CalendarDays, roles: everyone, primary: true },
  { to: '/on-call', label: 'On call', icon: Bell, roles: everyone, primary: true },
  { to: '/tanks', label: 'Tanks', icon: Fish, roles: everyone },
  { to: '/routines', label: 'Routines', icon: Repeat, roles: ['manager', 'supervisor', 'observer'] },
  { to: '/playbooks', label: 'Playbooks', icon: BookOpen, roles: ['manager', 'supervisor', 'observer'] },
  { to: '/oxygen', label: 'Oxygen', icon: Cylinder, roles: ['manager', 'supervisor', 'technician'] },
  { to: '/roster', label: 'Roster', icon: CalendarClock, roles: ['manager', 'supervisor'] },
  { to: '/incidents', label: 'Incidents', icon: Siren, roles: everyone },
  { to: '/reports', label: 'Reports', icon: BarChart3, roles: ['manager', 'supervisor', 'observer'] },
  { to: '/round-sheet', label: 'Round sheet', icon: Printer, roles: ['manager', 'supervisor', 'technician'] },
  { to: '/people', label: 'People', icon: Users, roles: ['manager'] },
  { to: '/outbox', label: 'Outbox', icon: Mail, roles: ['manager'] },
  { to: '/settings', label: 'Settings', icon: Settings, roles: everyone },
]

export const navFor = (role: Role) => NAV_ITEMS.filter((item) => item.roles.includes(role))
export const homeFor = (role: Role) => (role === 'observer' ? '/board' : '/round')
