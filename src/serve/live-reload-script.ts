/**
 * The script `stet watch --serve` adds to served HTML (never to the built
 * file). It listens to /__stet/events:
 * - `rebuilt` (data: ids of blocks whose values changed): remember them,
 *   reload, then mark those blocks for a few seconds;
 * - `failed` (data: the error text): show a small banner, keep the page;
 * - `ok`: remove the banner.
 * Text goes in with textContent, so error messages are never markup.
 * `<html data-stet-live="connected">` says the stream is open.
 */
export const liveReloadScript = `<script data-stet-live-reload>
(() => {
  const key = 'stet-changed';
  const changed = JSON.parse(sessionStorage.getItem(key) || '[]');
  sessionStorage.removeItem(key);
  const style = document.createElement('style');
  style.textContent = '.stet-changed{outline:3px solid #d9a400;outline-offset:3px;transition:outline-color 1s}' +
    '#stet-banner{position:fixed;left:0;right:0;bottom:0;margin:0;padding:.5em 1em;background:#7a1010;color:#fff;' +
    'font:13px/1.4 ui-monospace,monospace;white-space:pre-wrap;max-height:40vh;overflow:auto;z-index:9999}';
  document.head.append(style);
  for (const id of changed) {
    for (const el of document.querySelectorAll('[data-stet-block="' + CSS.escape(id) + '"], #fig-' + CSS.escape(id))) {
      el.classList.add('stet-changed');
      setTimeout(() => el.classList.remove('stet-changed'), 4000);
    }
  }
  const banner = (text) => {
    let el = document.getElementById('stet-banner');
    if (text === null) return el && el.remove();
    if (!el) {
      el = document.createElement('pre');
      el.id = 'stet-banner';
      el.setAttribute('role', 'status');
      document.body.append(el);
    }
    el.textContent = 'stet: the last rebuild failed; this is the previous output.\\n' + text;
  };
  const events = new EventSource('/__stet/events');
  events.addEventListener('open', () => { document.documentElement.dataset.stetLive = 'connected'; });
  events.addEventListener('rebuilt', (event) => {
    sessionStorage.setItem(key, event.data);
    events.close();
    location.reload();
  });
  events.addEventListener('failed', (event) => banner(JSON.parse(event.data)));
  events.addEventListener('ok', () => banner(null));
})();
</script>`;

/** HTML with the live-reload script before `</body>` (or at the end). */
export function withLiveReload(html: string): string {
  const at = html.lastIndexOf('</body>');
  return at === -1 ? html + liveReloadScript : html.slice(0, at) + liveReloadScript + '\n' + html.slice(at);
}
