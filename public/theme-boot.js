// Runs before the app: applies the last theme the user chose so the page does
// not flash light on a dark shop floor. Keep the key in step with src/lib/theme.ts.
(function () {
  var theme = 'system';
  try {
    theme = localStorage.getItem('pourscope:theme') || 'system';
  } catch (e) {
    /* storage blocked: follow the system */
  }
  var dark =
    theme === 'dark' ||
    (theme !== 'light' && window.matchMedia && window.matchMedia('(prefers-color-scheme: dark)').matches);
  document.documentElement.classList.toggle('dark', dark);
})();
