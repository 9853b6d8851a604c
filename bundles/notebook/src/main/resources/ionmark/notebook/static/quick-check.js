// The quick check: a molfile dropped on the structure box is read into it. Served as /static/notebook/quick-check.js.
(() => {
    const s = document.querySelector('form.im-quick textarea[name=structure]');
    if (!s) {
        return;
    }
    s.addEventListener('dragover', e => e.preventDefault());
    s.addEventListener('drop', e => {
        e.preventDefault();
        const f = e.dataTransfer.files[0];
        if (f) {
            f.text().then(x => { s.value = x; });
        }
    });
})();
