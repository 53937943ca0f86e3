import type { Role } from '#shared/schemas/person'

/** The invented demo facility's staff; job titles map onto Roundtide's four roles. */
export const DEMO_PEOPLE: Array<{
  name: string
  email: string
  title: string
  role: Role
  phone: string
  onCallEligible: boolean
}> = [
  {
    name: 'Maren Holloway',
    email: 'maren.holloway@brackenwater.example',
    title: 'Facility Manager',
    role: 'manager',
    phone: '+61 7 5550 0101',
    onCallEligible: true,
  },
  {
    name: 'Tomas Ferreira',
    email: 'tomas.ferreira@brackenwater.example',
    title: 'Senior Technician (life support & water quality)',
    role: 'supervisor',
    phone: '+61 7 5550 0102',
    onCallEligible: true,
  },
  {
    name: 'Priya Nandakumar',
    email: 'priya.nandakumar@brackenwater.example',
    title: 'Aquaculture Technician',
    role: 'technician',
    phone: '+61 7 5550 0103',
    onCallEligible: true,
  },
  {
    name: 'Josh Kettering',
    email: 'josh.kettering@brackenwater.example',
    title: 'Aquaculture Technician',
    role: 'technician',
    phone: '+61 7 5550 0104',
    onCallEligible: true,
  },
  {
    name: 'Ana Lutui',
    email: 'ana.lutui@brackenwater.example',
    title: 'Casual Technician (weekends, leave cover)',
    role: 'technician',
    phone: '+61 7 5550 0105',
    onCallEligible: false,
  },
  {
    name: 'Elliot Vance',
    email: 'elliot.vance@brackenwater.example',
    title: 'Research Scientist',
    role: 'observer',
    phone: '+61 7 5550 0106',
    onCallEligible: false,
  },
  {
    name: 'Sione Taufa',
    email: 'sione.taufa@brackenwater.example',
    title: 'Research Assistant (feeding trial)',
    role: 'technician',
    phone: '+61 7 5550 0107',
    onCallEligible: false,
  },
  {
    name: 'Ruth Amsel',
    email: 'ruth.amsel@brackenwater.example',
    title: 'Veterinarian and Animal Welfare Officer',
    role: 'observer',
    phone: '+61 7 5550 0108',
    onCallEligible: false,
  },
]
