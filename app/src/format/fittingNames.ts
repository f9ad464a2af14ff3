export { KIND_NAME, bearingText, fittingTitle } from '@mainbrace/solver';
