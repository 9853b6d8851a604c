// The web shell's behaviour, loaded by every page as /static/host/ionmark.js (no inline scripts: the page
// policy has no 'unsafe-inline'). Each part acts only when its elements are on the page.
(() => {
    // "Annotations are loading": reload once the solver has had a few seconds to start
    const loading = document.querySelector('[data-im-reload]');
    if (loading) {
        setTimeout(() => location.reload(), Number(loading.dataset.imReload) || 3000);
    }

    // The editor's live preview
    const t = document.getElementById('text'), p = document.getElementById('preview');
    if (!t || !p) {
        return;
    }
    const token = t.form.querySelector('input[name=token]').value;
    let h, seq = 0, last = '';
    // only the newest request may update the preview: answers can arrive out of order
    function r() {
        const my = ++seq;
        fetch('/preview', {method: 'POST', headers: {'X-Ionmark-Token': token}, body: t.value})
            .then(x => x.text())
            .then(x => { if (my === seq && x !== last) { last = x; p.innerHTML = x; } });
    }
    t.addEventListener('input', () => { clearTimeout(h); h = setTimeout(r, 300); });
    r();
    // a published table, or annotations that were not ready at the last keystroke, reach an open editor too:
    // ask again every 10 s while the page is shown, and touch the preview only on change
    setInterval(() => { if (document.visibilityState === 'visible') { r(); } }, 10000);
})();
