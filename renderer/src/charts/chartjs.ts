/**
 * chart.js for the app: the parts Hingeline's configurations use, registered once. The charts
 * themselves are built by core/charts (`toChartJsConfig`), the same code as the PDF report's.
 */
import {
  Chart, Filler, Legend, LineElement, LinearScale, PointElement, ScatterController, SubTitle, Title, Tooltip,
} from 'chart.js';

let registered = false;

export function chartJs(): typeof Chart {
  if (!registered) {
    Chart.register(ScatterController, LineElement, PointElement, LinearScale, Legend, Title, SubTitle, Tooltip, Filler);
    registered = true;
  }
  return Chart;
}
