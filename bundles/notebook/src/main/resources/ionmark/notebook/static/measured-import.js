// Measured-compound import: a chosen file is read into the text box. Served as /static/notebook/measured-import.js.
(() => {
    const file = document.getElementById('measured-file'), data = document.getElementById('measured-data');
    if (!file || !data) {
        return;
    }
    file.addEventListener('change', e => {
        const f = e.target.files[0];
        if (f) {
            f.text().then(x => { data.value = x; });
        }
    });
})();
