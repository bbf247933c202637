// The task list is part of the API's vocabulary, so it lives with the other code lists in
// server/schemas; the engine's rules name these codes.
export { taskCodes, taskLabels, type TaskCode } from '../../schemas/catalogue';
