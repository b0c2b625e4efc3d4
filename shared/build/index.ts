/** Site work: the bring-up checklist of a version and the build record's progress. */
export { bringUpSteps, plannedSessions, STEP_PHASES, type Step, type StepKind, type StepPhase } from '@/shared/build/steps';
