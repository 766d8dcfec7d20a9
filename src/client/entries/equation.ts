/** Page script of the Equation component: the copy buttons of the equation and the temperature-scale switch. */
import { mountEquationCopy } from '../copyEquation.ts';
import { mountTemperatureScale } from '../temperatureScale.ts';

mountEquationCopy();
mountTemperatureScale();
