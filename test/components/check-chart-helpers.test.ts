/// <reference types="mocha" />
// <check-chart>'s pure helpers: axis steps and label merging (run in the browser with the other
// component tests). Kind: behaviour.
import { expect } from '@open-wc/testing';
import { niceAxis, labelRows } from '../../components/check-chart.js';

describe('check-chart helpers', () => {
  it('niceAxis covers the range with round steps', () => {
    const a = niceAxis(43.2, 287.9);
    expect(a.min).to.be.at.most(43.2);
    expect(a.max).to.be.at.least(287.9);
    expect(a.ticks[1]! - a.ticks[0]!).to.equal(50);
    const flat = niceAxis(100, 100);
    expect(flat.max).to.be.greaterThan(flat.min);
  });

  it('labelRows merges labels of lines that sit on top of each other', () => {
    expect(
      labelRows([
        { y: 50, text: 'design' },
        { y: 52, text: 'relief' },
      ]),
    ).to.deep.equal([{ y: 50, text: 'design = relief' }]);
    expect(
      labelRows([
        { y: 50, text: 'design' },
        { y: 90, text: 'relief' },
      ]),
    ).to.have.length(2);
  });
});
