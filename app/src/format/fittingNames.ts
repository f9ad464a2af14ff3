export { KIND_NAME, bearingText, fittingTitle, kindName } from '@mainbrace/solver';
