// Apply the stored theme before first paint so there is no flash (a file, not inline: the API's CSP forbids inline scripts).
try {
  var t = localStorage.getItem("plumeline-theme");
  if (t === "dark" || t === "light") document.documentElement.dataset.theme = t;
} catch {
  // Storage can be blocked (private mode, policy): the default theme applies.
}
