/** Page script of the CodeSnippets component: the snippets' copy buttons and the evaluator. */
import { mountCopyButtons } from '../copyButtons.ts';
import { mountEvaluator } from '../evaluator.ts';

mountCopyButtons();
mountEvaluator();
