import { CalendarDays, Moon, Sun, Sunrise, type LucideIcon } from 'lucide-react'
import type { Shift } from '#shared/schemas/roster'

export const SHIFT_KIND_LOOK: Record<Shift['kind'], { label: string; icon: LucideIcon; start: string; end: string }> = {
  early: { label: 'Early', icon: Sunrise, start: '06:00', end: '14:00' },
  day: { label: 'Day', icon: Sun, start: '08:00', end: '16:30' },
  late: { label: 'Late', icon: Moon, start: '14:00', end: '22:00' },
  weekend: { label: 'Weekend', icon: CalendarDays, start: '07:00', end: '15:00' },
}
