// npm run db:seed | db:reset | db:passwords | db:backup | db:restore  (NUXT_DB_PATH picks the database file)
import { spawnSync } from 'node:child_process'
import { fileURLToPath } from 'node:url'

const cli = fileURLToPath(new URL('../server/database/cli.ts', import.meta.url))
const result = spawnSync(process.execPath, ['--import', 'tsx', cli, ...process.argv.slice(2)], { stdio: 'inherit' })
process.exit(result.status ?? 1)
