// @vitest-environment happy-dom
import { gradeFromFindings, RULE_TEXT } from '@shared/calc/condition-grade';
import { mount } from '@vue/test-utils';
import { describe, expect, it } from 'vitest';
import ConditionGradeRule from '@/components/ConditionGradeRule.vue';

describe('ConditionGradeRule', () => {
  it('writes out every line of the rule and marks the one that decided the grade, with why', async () => {
    const fair = gradeFromFindings([{ severity: 'moderate', extentPercent: 5 }]);
    const wrapper = mount(ConditionGradeRule, { props: { computedGrade: fair.grade, because: fair.because } });

    const lines = wrapper.findAll('li');
    expect(lines).toHaveLength(RULE_TEXT.length);
    lines.forEach((li, i) => expect(li.text().startsWith(RULE_TEXT[i]!)).toBe(true));
    const current = lines.filter((li) => li.attributes('aria-current') === 'step');
    expect(current).toHaveLength(1);
    expect(lines.indexOf(current[0]!)).toBe(fair.ruleLine);
    expect(current[0]!.text()).toContain('This line decided it: 1 moderate finding.');

    for (const findings of [[{ severity: 'critical' as const, extentPercent: null }], [{ severity: 'severe' as const, extentPercent: 1 }], []]) {
      const result = gradeFromFindings(findings);
      await wrapper.setProps({ computedGrade: result.grade, because: result.because });
      const marked = wrapper.findAll('li').findIndex((li) => li.attributes('aria-current') === 'step');
      expect(marked).toBe(result.ruleLine);
      expect(wrapper.find('[aria-current="step"]').text()).toContain(result.because);
    }
  });
});
