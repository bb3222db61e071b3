// The timer's public face: the bar the shell shows while a timer runs, and the button that starts one.
export { TimerBar } from './timer-bar/timer-bar';
export { TimerStartButton } from './timer-start-button/timer-start-button';
