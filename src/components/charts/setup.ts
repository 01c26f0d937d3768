/** Registers only the Chart.js parts our plots use (keeps the bundle small) and shared styling. */
import {
  Chart,
  Legend,
  LinearScale,
  LineController,
  LineElement,
  PointElement,
  ScatterController,
  Title,
  Tooltip,
} from 'chart.js';

Chart.register(LineController, ScatterController, LineElement, PointElement, LinearScale, Title, Tooltip, Legend);
Chart.defaults.font.family = "'Source Sans 3', system-ui, sans-serif";
Chart.defaults.color = '#3b4b52';

/** Hot stream copper, coolant teal: the brand colours, readable by most colour-blind readers. */
export const HOT = '#c4601f';
export const COLD = '#2f7f8c';
export const MUTED = '#8aa3a9';

/** An axis title with its unit, e.g. "Temperature (°C)". */
export function axisTitle(text: string): { display: true; text: string; font: { weight: 'bold' } } {
  return { display: true, text, font: { weight: 'bold' } };
}
