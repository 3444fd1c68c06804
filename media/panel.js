// Decomposition panel script: reads the description embedded as JSON and typesets each section
// with KaTeX. Never evaluates anything from the note; KaTeX only parses the LaTeX it is given.
(function () {
  const data = JSON.parse(document.getElementById('notary-data').textContent);
  const root = document.getElementById('root');
  const d = data.description;
  const h1 = document.createElement('h1');
  h1.textContent = d.name ? 'Decomposition of ' + d.name : 'Matrix decomposition';
  root.appendChild(h1);
  for (const section of d.sections) {
    const s = document.createElement('section');
    const h = document.createElement('h2');
    h.textContent = section.title;
    s.appendChild(h);
    if (section.latex) {
      const m = document.createElement('div');
      m.className = 'math';
      try {
        // eslint-disable-next-line no-undef
        katex.render(section.latex, m, { displayMode: true, throwOnError: false });
      } catch (e) {
        m.textContent = section.latex;
      }
      s.appendChild(m);
    }
    if (section.text) {
      const p = document.createElement('p');
      p.textContent = section.text;
      s.appendChild(p);
    }
    root.appendChild(s);
  }
  if (d.caution) {
    const c = document.createElement('p');
    c.className = 'caution';
    c.setAttribute('role', 'note');
    c.textContent = 'Caution: ' + data.caution;
    root.appendChild(c);
  }
})();
