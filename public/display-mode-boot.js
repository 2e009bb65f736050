// Runs before the first paint. Keep the key and values in step with src/lib/display-mode.ts.
(function () {
  var mode = 'system';
  try {
    var saved = window.localStorage.getItem('ringseat.display-mode');
    if (saved === 'day' || saved === 'night' || saved === 'system') mode = saved;
  } catch {
    // Storage can be blocked (private browsing); the system setting applies then.
  }
  document.documentElement.setAttribute('data-theme', mode);
})();
