// npm start: migrate and seed the demo on an empty database, build if needed, serve on
// 127.0.0.1:3000 (HOST=0.0.0.0 or an address to be reached from the network).
import { spawn } from 'node:child_process'
import { join } from 'node:path'
import { buildIfStale, root } from './lib.mjs'

buildIfStale()
const port = process.env.PORT || '3000'
const env = {
  ...process.env,
  PORT: port,
  HOST: process.env.HOST || '127.0.0.1',
  NUXT_DB_PATH: process.env.NUXT_DB_PATH || join(root, '.data/kernwise.sqlite'),
  NUXT_SEED_DEMO: process.env.NUXT_SEED_DEMO ?? 'true',
}
console.log(`[kernwise] serving http://${env.HOST.includes(':') ? `[${env.HOST}]` : env.HOST}:${port} (database ${env.NUXT_DB_PATH})${env.HOST === '127.0.0.1' ? '; set HOST=0.0.0.0 to serve the network' : ''}`)
const child = spawn(process.execPath, [join(root, '.output/server/index.mjs')], { cwd: root, env, stdio: 'inherit' })
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => child.kill(signal))
child.on('exit', code => process.exit(code ?? 0))
