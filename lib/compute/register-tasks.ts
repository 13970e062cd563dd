// Registers the model tasks (pure fem/ work) so the worker and the inline fallback know them.
import {
  probabilityTask,
  squeezeTask,
  type ProbabilityTaskInput,
  type SqueezeTaskInput,
} from './squeeze-task';
import { registerTask } from './task-table';

registerTask('squeeze', (input) => squeezeTask(input as SqueezeTaskInput));
registerTask('squeeze-probability', (input, progress) =>
  probabilityTask(input as ProbabilityTaskInput, progress),
);
