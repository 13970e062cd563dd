// Registers the model tasks (pure fem/ work) so the worker and the inline fallback know them.
import {
  probabilityTask,
  squeezeCheckTask,
  type ProbabilityTaskInput,
  type SqueezeCheckTaskInput,
} from './squeeze-task';
import { registerTask } from './task-table';

registerTask('squeeze-check', (input) => squeezeCheckTask(input as SqueezeCheckTaskInput));
registerTask('squeeze-probability', (input, progress) =>
  probabilityTask(input as ProbabilityTaskInput, progress),
);
