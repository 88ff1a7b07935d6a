package dev.mesolint.core.report;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Base64;

/**
 * The report's one inline script, an enhancement only: without it every programme is open, every finding shown and
 * the index in file order. With it the index sorts by any column, the findings of a programme filter by severity and
 * rule, and printing opens collapsed programmes. The page's Content-Security-Policy allows this script by its
 * SHA-256 hash and nothing else.
 */
final class HtmlScript {
    static final String JS = """
            (function () {
              'use strict';
              function text(el) { return (el.getAttribute('data-sort') || el.textContent).trim(); }
              document.querySelectorAll('table.index').forEach(function (table) {
                var heads = table.querySelectorAll('thead th');
                heads.forEach(function (th, col) {
                  var button = document.createElement('button');
                  button.type = 'button';
                  button.className = 'sort';
                  button.textContent = th.textContent;
                  th.textContent = '';
                  th.appendChild(button);
                  th.setAttribute('aria-sort', 'none');
                  button.addEventListener('click', function () {
                    var ascending = th.getAttribute('aria-sort') !== 'ascending';
                    heads.forEach(function (other) { other.setAttribute('aria-sort', 'none'); });
                    th.setAttribute('aria-sort', ascending ? 'ascending' : 'descending');
                    var body = table.tBodies[0];
                    var rows = Array.prototype.slice.call(body.rows);
                    rows.sort(function (a, b) {
                      var x = text(a.cells[col]), y = text(b.cells[col]);
                      var nx = parseFloat(x), ny = parseFloat(y);
                      var order = !isNaN(nx) && !isNaN(ny) ? nx - ny : x.localeCompare(y);
                      return ascending ? order : -order;
                    });
                    rows.forEach(function (row) { body.appendChild(row); });
                  });
                });
              });
              document.querySelectorAll('.findings-block').forEach(function (block) {
                var items = block.querySelectorAll('li.finding');
                if (items.length < 2) { return; }
                var form = document.createElement('div');
                form.className = 'filter';
                form.setAttribute('role', 'group');
                form.setAttribute('aria-label', 'Show findings');
                var severities = ['error', 'warning', 'info', 'waived'];
                var shown = {};
                severities.forEach(function (s) {
                  if (!block.querySelector('li.finding[data-severity="' + s + '"]')) { return; }
                  var label = document.createElement('label');
                  var box = document.createElement('input');
                  box.type = 'checkbox';
                  box.checked = true;
                  box.value = s;
                  shown[s] = true;
                  box.addEventListener('change', function () { shown[s] = box.checked; apply(); });
                  label.appendChild(box);
                  label.appendChild(document.createTextNode(' ' + s));
                  form.appendChild(label);
                });
                var rules = [];
                items.forEach(function (li) {
                  var r = li.getAttribute('data-rule');
                  if (rules.indexOf(r) < 0) { rules.push(r); }
                });
                rules.sort();
                var ruleLabel = document.createElement('label');
                ruleLabel.appendChild(document.createTextNode('rule '));
                var select = document.createElement('select');
                [''].concat(rules).forEach(function (r) {
                  var option = document.createElement('option');
                  option.value = r;
                  option.textContent = r === '' ? 'all rules' : r;
                  select.appendChild(option);
                });
                select.addEventListener('change', apply);
                ruleLabel.appendChild(select);
                form.appendChild(ruleLabel);
                var count = document.createElement('span');
                count.className = 'count';
                count.setAttribute('aria-live', 'polite');
                form.appendChild(count);
                var title = block.querySelector('h3');
                title.parentNode.insertBefore(form, title.nextSibling);
                function apply() {
                  var visible = 0;
                  items.forEach(function (li) {
                    var ok = shown[li.getAttribute('data-severity')] &&
                      (select.value === '' || li.getAttribute('data-rule') === select.value);
                    li.hidden = !ok;
                    visible += ok ? 1 : 0;
                  });
                  block.querySelectorAll('.group').forEach(function (group) {
                    group.hidden = !group.querySelector('li.finding:not([hidden])');
                  });
                  count.textContent = visible + ' of ' + items.length + ' shown';
                }
                apply();
              });
              var closed = [];
              window.addEventListener('beforeprint', function () {
                closed = Array.prototype.filter.call(document.querySelectorAll('details'), function (d) { return !d.open; });
                closed.forEach(function (d) { d.open = true; });
              });
              window.addEventListener('afterprint', function () {
                closed.forEach(function (d) { d.open = false; });
              });
            })();
            """;

    /** The CSP source that allows exactly {@link #JS}: {@code 'sha256-...'}. */
    static final String CSP_SOURCE = "'sha256-" + sha256(JS) + "'";

    private HtmlScript() {
    }

    private static String sha256(String script) {
        try {
            byte[] digest = MessageDigest.getInstance("SHA-256").digest(script.getBytes(StandardCharsets.UTF_8));
            return Base64.getEncoder().encodeToString(digest);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }
}
