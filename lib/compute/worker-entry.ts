// The bundle entry of dist/compute-worker.mjs: every task registered, then the runner.
import './register-tasks';
export { default } from './tasks';
