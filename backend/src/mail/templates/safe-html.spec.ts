import { describe, expect, it } from '@jest/globals';
import { escapeHtml } from './escape-html';
import { markup } from './safe-html';

describe('markup template tag', () => {
  it('should escape every interpolated value', () => {
    expect(markup`<p title="${'"x" & \'y\''}">${'<b>'}</p>`.value).toBe(
      '<p title="&quot;x&quot; &amp; &#39;y&#39;">&lt;b&gt;</p>',
    );
  });

  it('should keep nested fragments, join arrays and drop empty values', () => {
    const items = ['a<', 'b'].map((item) => markup`<li>${item}</li>`);
    expect(markup`<ul>${items}</ul>${undefined}${null}${false}${0}`.value).toBe(
      '<ul><li>a&lt;</li><li>b</li></ul>0',
    );
  });

  it('should escape the five HTML-special characters', () => {
    expect(escapeHtml(`<>&"'`)).toBe('&lt;&gt;&amp;&quot;&#39;');
  });
});
