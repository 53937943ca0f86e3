// Renders public/icon.svg to the PNG sizes the web app manifest lists, with Debian's chromium
// (no downloads). Run once after changing the icon: npx tsx scripts/make-pwa-icons.ts
import { readFile } from 'node:fs/promises'
import path from 'node:path'
import { chromium } from 'playwright-core'

const svg = await readFile(path.resolve('public/icon.svg'), 'utf8')
const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu'] })
const page = await browser.newPage()

// "maskable" icons are cropped to a circle by some launchers, so the mark sits inside the middle 80 %.
const targets = [
  { file: 'pwa-192.png', size: 192, inset: 0, radius: true },
  { file: 'pwa-512.png', size: 512, inset: 0, radius: true },
  { file: 'pwa-maskable-512.png', size: 512, inset: 0.1, radius: false },
  { file: 'apple-touch-icon.png', size: 180, inset: 0.06, radius: false },
]
for (const t of targets) {
  const pad = Math.round(t.size * t.inset)
  const mark = t.radius ? svg : svg.replace(/rx="\d+"/, 'rx="0"')
  await page.setViewportSize({ width: t.size, height: t.size })
  await page.setContent(
    `<body style="margin:0;background:${t.radius ? 'transparent' : '#142e3a'}"><div style="padding:${pad}px;width:${t.size - 2 * pad}px;height:${t.size - 2 * pad}px">${mark.replace('<svg ', '<svg width="100%" height="100%" ')}</div></body>`,
  )
  await page.screenshot({ path: path.resolve('public', t.file), omitBackground: t.radius })
  console.log(`public/${t.file}`)
}
await browser.close()
