/**
 * The number field: unit shown, typed values stored in internal units, text that is not a number
 * kept and flagged (never overwritten), core's messages shown next to the field.
 */
import { mount } from '@vue/test-utils';
import { describe, expect, it } from 'vitest';
import NumberField from '../../../renderer/src/components/NumberField.vue';
import { historyRevision, revertFocusedField } from '../../../renderer/src/composables/field-history.ts';

function field(props: Record<string, unknown> = {}) {
  return mount(NumberField, { props: { modelValue: 7315.2, quantity: 'spanLength', system: 'us', label: 'Span', ...props } });
}

describe('NumberField', () => {
  it('shows the stored value in the project unit, with the unit and a label', () => {
    const wrapper = field();
    const input = wrapper.get('input');
    expect(input.element.value).toBe('24');
    expect(wrapper.text()).toContain('ft');
    expect(wrapper.get('label').attributes('for')).toBe(input.attributes('id'));
  });

  it('emits the internal value of what is typed: 20 ft → 6096 mm', async () => {
    const wrapper = field();
    await wrapper.get('input').setValue('20');
    // NIST SP 811 Appendix B.8: 1 ft = 0.3048 m exactly
    expect(wrapper.emitted('update:modelValue')).toEqual([[6096]]);
  });

  it('keeps text that is not a number, flags it and stores nothing', async () => {
    const wrapper = field();
    const input = wrapper.get('input');
    await input.setValue('2O');
    expect(wrapper.emitted('update:modelValue')).toBeUndefined();
    expect(input.attributes('aria-invalid')).toBe('true');
    expect(wrapper.text()).toContain('the value in use is still 24 ft');
    await input.trigger('blur');
    expect(input.element.value).toBe('2O');
    // A change from outside (undo) does not wipe what the user typed.
    await wrapper.setProps({ modelValue: 6096 });
    expect(input.element.value).toBe('2O');
    expect(wrapper.text()).toContain('the value in use is still 20 ft');
  });

  it('takes a new stored value from outside when the user is not typing there', async () => {
    const wrapper = field();
    await wrapper.setProps({ modelValue: 6096 });
    expect(wrapper.get('input').element.value).toBe('20');
    await wrapper.setProps({ system: 'si' });
    expect(wrapper.get('input').element.value).toBe('6.096');
    expect(wrapper.text()).toContain('m');
  });

  it('Escape gives up the text typed and shows the stored value again', async () => {
    const wrapper = field();
    const input = wrapper.get('input');
    await input.setValue('abc');
    await input.trigger('keydown', { key: 'Escape' });
    expect(input.element.value).toBe('24');
    expect(input.attributes('aria-invalid')).toBe('false');
  });

  it('an optional field left empty stores undefined (the default)', async () => {
    const wrapper = field({ optional: true, modelValue: 30000, quantity: 'modulus', system: 'si' });
    await wrapper.get('input').setValue('');
    expect(wrapper.emitted('update:modelValue')).toEqual([[undefined]]);
  });

  it('an empty required field is flagged, not stored', async () => {
    const wrapper = field();
    await wrapper.get('input').setValue('  ');
    expect(wrapper.emitted('update:modelValue')).toBeUndefined();
    expect(wrapper.text()).toContain('enter a value');
  });

  it('shows core’s message for the field and links it for assistive technology', () => {
    const wrapper = field({ diagnostics: [{ message: 'must be greater than 0 m and at most 60 m, got -2 m', severity: 'error' }] });
    const input = wrapper.get('input');
    const message = wrapper.get('.field-msg');
    expect(message.text()).toContain('greater than 0 m');
    expect(input.attributes('aria-describedby')).toBe(message.attributes('id'));
    expect(input.attributes('aria-invalid')).toBe('true');
  });

  it('normalises what was typed when the field is left (600 mm typed in an inch field)', async () => {
    const wrapper = field({ quantity: 'sectionLength', modelValue: 609.6 });
    const input = wrapper.get('input');
    await input.trigger('focus');
    await input.setValue('600 mm');
    expect(wrapper.emitted('update:modelValue')).toEqual([[600]]);
    await wrapper.setProps({ modelValue: 600 });
    await input.trigger('blur');
    expect(input.element.value).toBe('23.622047');
    expect(wrapper.emitted('done')).toHaveLength(1);
  });

  it('shows a value restored by undo also while it has the focus (the text follows the value)', async () => {
    const wrapper = field({ quantity: 'sectionLength', modelValue: 609.6 });
    const input = wrapper.get('input');
    await input.trigger('focus');
    await input.setValue('30');
    await wrapper.setProps({ modelValue: 762 });
    // Typing: the field keeps the user's spelling.
    await input.setValue('30.');
    await wrapper.setProps({ modelValue: 762 });
    expect(input.element.value).toBe('30.');
    // Undo (the document store bumps the history revision) restores 24 in, focused or not.
    historyRevision.value++;
    await wrapper.setProps({ modelValue: 609.6 });
    expect(input.element.value).toBe('24');
    await input.setValue('25');
    await wrapper.setProps({ modelValue: 635 });
    expect(input.element.value).toBe('25');
  });

  it('Ctrl+Z in a field holding text not yet stored gives that text up first, and nothing else', async () => {
    const wrapper = field();
    const input = wrapper.get('input');
    await input.trigger('focus');
    await input.setValue('2O');
    expect(revertFocusedField()).toBe(true);
    await wrapper.vm.$nextTick();
    expect(input.element.value).toBe('24');
    expect(input.attributes('aria-invalid')).toBe('false');
    // Nothing unstored left: the next Ctrl+Z goes to the app's undo.
    expect(revertFocusedField()).toBe(false);
    await input.trigger('blur');
    expect(revertFocusedField()).toBe(false);
  });

  it('reads and writes a notation of its own (bar sizes) and passes what else it read', async () => {
    const wrapper = field({
      quantity: 'sectionLength',
      modelValue: 25.4,
      textOf: (v: number | undefined) => (v === 25.4 ? '#8' : null),
      read: (text: string) => (text.includes('#') ? { ok: true, value: 28.6512, extra: 3 } : null),
    });
    const input = wrapper.get('input');
    expect(input.element.value).toBe('#8');
    // The unit is not shown beside a designation.
    expect(wrapper.get('.unit').text()).toBe('');
    await input.setValue('3 #9');
    expect(wrapper.emitted('update:modelValue')).toEqual([[28.6512, 3]]);
    await input.setValue('1.25');
    expect(wrapper.emitted('update:modelValue')![1]).toEqual([31.75]);
    expect(wrapper.get('.unit').text()).toBe('in');
  });
});
