(function () {
  'use strict';
  var collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });
  function key(cell, numeric) {
    var raw = cell.getAttribute('data-sort');
    if (!numeric) {
      return raw === null ? cell.textContent.trim() : raw;
    }
    return raw === null || raw === '' ? NaN : parseFloat(raw);
  }
  function compare(a, b, numeric, direction) {
    if (numeric) {
      var an = isNaN(a), bn = isNaN(b);
      if (an || bn) {
        return an === bn ? 0 : (an ? 1 : -1);
      }
      return direction * (a - b);
    }
    return direction * collator.compare(a, b);
  }
  function sort(table, column, header) {
    var body = table.tBodies[0];
    if (!body) {
      return;
    }
    var numeric = header.getAttribute('data-kind') !== 'text';
    var direction = header.getAttribute('aria-sort') === 'ascending' ? -1 : 1;
    var rows = Array.prototype.slice.call(body.rows).map(function (row, index) {
      return { row: row, index: index, key: key(row.cells[column], numeric) };
    });
    rows.sort(function (x, y) {
      return compare(x.key, y.key, numeric, direction) || x.index - y.index;
    });
    rows.forEach(function (r) {
      body.appendChild(r.row);
    });
    Array.prototype.forEach.call(table.tHead.rows[0].cells, function (th) {
      th.setAttribute('aria-sort', 'none');
    });
    header.setAttribute('aria-sort', direction === 1 ? 'ascending' : 'descending');
  }
  Array.prototype.forEach.call(document.querySelectorAll('table.sortable'), function (table) {
    if (!table.tHead) {
      return;
    }
    Array.prototype.forEach.call(table.tHead.rows[0].cells, function (th, column) {
      var button = th.querySelector('button');
      if (button) {
        button.addEventListener('click', function () {
          sort(table, column, th);
        });
      }
    });
    table.setAttribute('data-sortable-ready', 'yes');
  });
  document.documentElement.setAttribute('data-sort-ready', 'yes');
})();
