// The rules that cost the rule check the most work, one or more per class the rule fuzz found
// (dense, never matching, BYSETPOS oddities, a first date far after the start). The security
// test, the work-budget unit test and the bench all measure this one list.

const everyMinute = Array.from({ length: 60 }, (_, minute) => minute).join(',')

export const WORST_RULES = {
  dense: [
    'FREQ=SECONDLY',
    'FREQ=SECONDLY;INTERVAL=7',
    'FREQ=MINUTELY',
    'FREQ=MINUTELY;INTERVAL=14',
    'FREQ=HOURLY;BYMINUTE=0,10,20,30,40,50',
    `FREQ=HOURLY;BYMINUTE=${everyMinute};BYSECOND=${everyMinute}`,
    `FREQ=DAILY;BYHOUR=0,1,2,3,4,5;BYMINUTE=${everyMinute}`,
  ],
  // Dense but allowed: one task every 15 minutes is the limit itself, so all 4,032 are counted.
  atTheLimit: ['FREQ=MINUTELY;INTERVAL=15', 'FREQ=HOURLY;BYMINUTE=0,15,30,45'],
  neverMatching: [
    'FREQ=HOURLY;BYSETPOS=2;BYMINUTE=0',
    'FREQ=DAILY;BYSETPOS=2;BYHOUR=1',
    'FREQ=MINUTELY;BYSETPOS=2;BYSECOND=0',
    'FREQ=SECONDLY;BYSETPOS=2;BYSECOND=0',
    'FREQ=WEEKLY;BYSETPOS=9;BYDAY=MO,TU',
    'FREQ=MONTHLY;BYSETPOS=40;BYDAY=MO,TU,WE,TH,FR,SA,SU',
    'FREQ=MINUTELY;BYHOUR=3;BYMINUTE=0;BYSETPOS=2',
    'FREQ=YEARLY;BYSETPOS=2;BYMONTH=2;BYMONTHDAY=29',
  ],
  // rrule rebuilds 360 or 60 times in every period, and no period has the position asked for.
  bysetposOddities: [
    `FREQ=HOURLY;BYMINUTE=${everyMinute};BYSECOND=0,1,2,3,4,5;BYSETPOS=366`,
    `FREQ=MINUTELY;BYSECOND=${everyMinute};BYSETPOS=-366`,
    `FREQ=DAILY;BYHOUR=0,1,2,3,4,5;BYMINUTE=${everyMinute};BYSETPOS=366`,
  ],
  // The first date comes after most of the search budget is spent.
  lateFirstDate: ['FREQ=DAILY;BYMONTH=2;BYMONTHDAY=29;BYDAY=SU', 'FREQ=HOURLY;BYMONTH=2;BYMONTHDAY=29', 'FREQ=MINUTELY;INTERVAL=15;BYMONTH=2;BYMONTHDAY=29'],
} as const

export const ALL_WORST_RULES: string[] = Object.values(WORST_RULES).flat()
