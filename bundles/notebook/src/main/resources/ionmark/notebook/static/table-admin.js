// The table admin page, served as /static/notebook/table-admin.js: task forms carry the draft, line numbers
// beside the raw JSON, live validation while it is edited, problem links that jump to their line, a loaded
// file replaces the draft, and sortable columns.
(() => {
    const d = document.getElementById('draft');
    if (!d) {
        return;
    }
    document.querySelectorAll('form.im-task').forEach(f => f.addEventListener('submit', () => {
        f.querySelector('.im-draft-copy').value = d.value;
    }));

    const g = document.getElementById('gutter');
    const num = () => {
        const n = d.value.split('\n').length;
        let s = '';
        for (let i = 1; i <= n; i++) s += i + '\n';
        g.textContent = s;
    };
    num();
    d.addEventListener('input', num);
    d.addEventListener('scroll', () => { g.scrollTop = d.scrollTop; });

    const goTo = line => {
        const raw = document.getElementById('raw');
        if (raw) raw.open = true;
        const ls = d.value.split('\n');
        let p = 0;
        for (let i = 0; i < line - 1 && i < ls.length; i++) p += ls[i].length + 1;
        d.focus();
        d.setSelectionRange(p, p + (ls[line - 1] || '').length);
        d.scrollTop = Math.max(0, (line - 3)) * parseFloat(getComputedStyle(d).lineHeight);
        g.scrollTop = d.scrollTop;
    };
    window.imGoto = goTo;

    // live validation of the raw JSON: only the newest answer is shown
    const l = document.getElementById('live');
    const token = d.form.querySelector('input[name=token]').value;
    let h, seq = 0;
    d.addEventListener('input', () => {
        clearTimeout(h);
        h = setTimeout(() => {
            const my = ++seq;
            fetch('/admin/table', {method: 'POST', headers: {'Content-Type': 'application/x-www-form-urlencoded'},
                body: new URLSearchParams({token: token, action: 'validate', draft: d.value})})
                .then(x => x.text())
                .then(x => {
                    if (my === seq) {
                        const doc = new DOMParser().parseFromString(x, 'text/html');
                        const p = doc.getElementById('problems');
                        l.innerHTML = p ? p.innerHTML : '';
                    }
                });
        }, 600);
    });
    document.addEventListener('click', e => {
        const a = e.target.closest('[data-line]');
        if (a) {
            e.preventDefault();
            goTo(+a.dataset.line);
        }
    });
    document.getElementById('upload').addEventListener('change', e => {
        const f = e.target.files[0];
        if (f) {
            f.text().then(t => { d.value = t; d.dispatchEvent(new Event('input')); });
        }
    });

    document.querySelectorAll('th[data-sort]').forEach(th => th.addEventListener('click', () => {
        const tb = th.closest('table').tBodies[0];
        const i = [...th.parentNode.children].indexOf(th);
        const dir = th.dataset.dir === 'asc' ? 'desc' : 'asc';
        th.dataset.dir = dir;
        const key = r => {
            const c = r.children[i];
            const v = c.dataset.v !== undefined ? c.dataset.v : c.textContent;
            const n = parseFloat(v);
            return isNaN(n) ? v : n;
        };
        [...tb.rows].sort((a, b) => {
            const x = key(a), y = key(b);
            const c = x < y ? -1 : x > y ? 1 : 0;
            return dir === 'asc' ? c : -c;
        }).forEach(r => tb.appendChild(r));
    }));
})();
