import {
  BarController,
  BarElement,
  CategoryScale,
  Chart,
  Legend,
  LinearScale,
  LineController,
  LineElement,
  LogarithmicScale,
  PointElement,
  ScatterController,
  Tooltip,
} from 'chart.js';

// chart.js is tree-shaken: register only what the plots use, once.
Chart.register(
  BarController,
  BarElement,
  CategoryScale,
  Legend,
  LinearScale,
  LineController,
  LineElement,
  LogarithmicScale,
  PointElement,
  ScatterController,
  Tooltip,
);

/** Distinct colours for the modes and the combination rules, readable on white. */
export const SERIES_COLOURS = ['#23465f', '#b5541c', '#3d8b5a', '#7a4a9e', '#9a7b12', '#c0394b'];

/** Animation off: the plots redraw as the designer types. */
export const STATIC_CHART = {
  animation: false as const,
  responsive: true,
  maintainAspectRatio: false,
};
