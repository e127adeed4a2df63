/**
 * The existing-beam panels with the demo's B-204 (cores, 8 % bar loss, spalled soffit, a CFRP and
 * an overlay scheme): the as-found editor shows the statistics the results derived and turns each
 * field into one undoable edit; the strengthening editor adds, duplicates and removes schemes and
 * marks one preferred; the comparison, shear and service views read every number from the results.
 */
import { createTestingPinia } from '@pinia/testing';
import { mount } from '@vue/test-utils';
import { defineComponent, h, type PropType } from 'vue';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { analyzeMembers } from '../../../core/analysis.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';
import type { ChartSpec } from '../../../core/charts/types.ts';
import { demoProject } from '../../../core/project/demo.ts';
import type { MemberDefinition, Project } from '../../../core/project/types.ts';
import { createFakeHost, setHostForTesting } from '../../../renderer/src/host/index.ts';
import { useAnalysisStore } from '../../../renderer/src/stores/analysis.ts';
import { useDocumentStore } from '../../../renderer/src/stores/document.ts';
import AsFoundEditor from '../../../renderer/src/views/member/AsFoundEditor.vue';
import ComparisonPanel from '../../../renderer/src/views/member/ComparisonPanel.vue';
import ServicePanel from '../../../renderer/src/views/member/ServicePanel.vue';
import ShearPanel from '../../../renderer/src/views/member/ShearPanel.vue';
import StrengtheningEditor from '../../../renderer/src/views/member/StrengtheningEditor.vue';
import { setMemberField } from '../../../renderer/src/project/edits.ts';
import { addScheme, removeScheme } from '../../../renderer/src/project/retrofit-factories.ts';
import { setWorkerFactory } from '../../../renderer/src/workers/engine.ts';
import { silentFactory } from '../support.ts';

/** Stands in for the canvas chart: the spec's title and series labels. */
const ChartStub = defineComponent({
  props: { spec: { type: Object as PropType<ChartSpec>, required: true }, testid: { type: String, default: '' } },
  setup(props) {
    return () => h('div', { class: 'chart-stub', 'data-testid': props.testid, 'data-title': props.spec.title, 'data-series': props.spec.series.map((s) => s.label).join('|') });
  },
});

const project = demoProject();
const member = project.members.find((m) => m.id === 'B-204')!;
let result: MemberResult;

beforeAll(() => {
  result = analyzeMembers(project, ['B-204'])[0]!;
}, 120_000);

function setup<C>(component: C, props: Record<string, unknown> = {}) {
  setHostForTesting(createFakeHost());
  setWorkerFactory(silentFactory);
  const pinia = createTestingPinia({
    createSpy: vi.fn,
    stubActions: (name, store) => (store.$id === 'document' && name === 'edit') || (store.$id === 'analysis' && (name === 'diagnosticsOf' || name === 'detailOf')),
  });
  const documentStore = useDocumentStore(pinia);
  documentStore.load(project, null, null, true);
  const analysis = useAnalysisStore(pinia);
  vi.mocked(analysis.diagnosticsOf).mockReturnValue([]);
  vi.mocked(analysis.detailOf).mockReturnValue({ result, current: true });
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- one helper mounts five components with different props
  const wrapper = mount(component as any, { props: { member, ...props }, global: { plugins: [pinia], stubs: { ChartCanvas: ChartStub } } });
  /** The last edit: its label, and the member its change function produces. */
  const lastEdit = () => {
    const [label, change] = vi.mocked(documentStore.edit).mock.lastCall! as [string, (p: Project) => Project];
    const next = change(project);
    return { label, next, member: next.members.find((m) => m.id === member.id) as MemberDefinition };
  };
  return { wrapper, lastEdit, documentStore };
}

describe('AsFoundEditor', () => {
  it('shows the in-place strength the results derived from the cores, with the method named', () => {
    const { wrapper } = setup(AsFoundEditor);
    const derived = result.retrofit!.asFound!.concrete[0]!;
    const text = wrapper.get('[data-testid=core-result-0]').text();
    expect(text).toContain('n = 6, V = 0.110');
    // f′c,eq = f̄c(1 − K·V) (ACI 214.4R-10, from memory) with the K the results used: 3500 psi × (1 − K × 0.11).
    const expected = 3500 * (1 - derived.inPlace.factor * 0.11);
    expect(derived.inPlace.strength / 0.006894757).toBeCloseTo(expected, 0);
    expect(text).toContain(`${Number(expected.toPrecision(3))} psi`);
    expect(text).toContain('ACI 214.4R-10');
    // both strengths, each with what it is used for (issue 11 item 3)
    expect(wrapper.get('[data-testid=core-mean-used]').text()).toBe('3500 psi');
    expect(text).toContain('Mean f̄c (behaviour)');
    expect(text).toContain('Equivalent specified f′c,eq (code checks)');
    expect(wrapper.get('[data-testid=core-strength-use]').text()).toMatch(/mean f̄c is used for the behaviour .*Ec.*; f′c,eq for the code checks \(φMn, shear capacity/);
  });

  it('draws the section as found, the corroded layer and the lost outline named', () => {
    const { wrapper } = setup(AsFoundEditor);
    const drawing = wrapper.get('[data-testid=as-found-drawing]');
    expect(drawing.get('img').attributes('src')).toMatch(/^data:image\/svg\+xml/);
    expect(drawing.text()).toContain('corroded 8 %');
    expect(drawing.text()).toContain('outline before the concrete was lost');
  });

  it('a changed core count is one edit of that field, in place', async () => {
    const { wrapper, lastEdit } = setup(AsFoundEditor);
    await wrapper.get('[data-testid=core-count-0]').setValue('8');
    const edit = lastEdit();
    expect(edit.label).toBe('Change number of cores');
    expect(edit.member.asFound!.cores![0]!.count).toBe(8);
    expect(edit.member.asFound!.defects).toBe(member.asFound!.defects);
  });

  it('adds a cover-loss defect, and removing every item removes the condition', async () => {
    const { wrapper, lastEdit } = setup(AsFoundEditor);
    await wrapper.get('[data-testid=add-cover-loss]').trigger('click');
    expect(lastEdit().member.asFound!.defects!.map((d) => d.kind)).toEqual(['section-loss', 'cover-loss', 'cover-loss']);
    await wrapper.get('[data-testid=remove-as-found]').trigger('click');
    expect(lastEdit().label).toBe('Remove as-found data');
    expect(lastEdit().member.asFound).toBeUndefined();
  });
});

describe('StrengtheningEditor', () => {
  it('lists each scheme with its status and what it changes, drawn on the section', () => {
    const { wrapper } = setup(StrengtheningEditor);
    expect(wrapper.findAll('[data-testid^=scheme-name-]')).toHaveLength(2);
    const statement = wrapper.get('[data-testid=scheme-statement-1]').text();
    expect(statement).toContain('design moment +');
    expect(wrapper.get('[data-testid=scheme-drawing-0]').text()).toContain('FRP');
    expect(wrapper.get('[data-testid=scheme-drawing-1]').text()).toContain('new concrete layer');
  });

  it('adds an FRP scheme with the project\'s FRP material, as one edit', async () => {
    const { wrapper, lastEdit } = setup(StrengtheningEditor);
    await wrapper.get('[data-testid=add-frp-scheme]').trigger('click');
    const edit = lastEdit();
    expect(edit.label).toBe('Add externally bonded frp');
    const added = edit.member.schemes![2]!;
    expect(added).toMatchObject({ kind: 'frp', frpId: 'cfrp-sheet', plies: 2, face: 'bottom' });
    expect(edit.member.schemes!.map((s) => s.id)).toEqual(['cfrp-2', 'overlay-3', 'frp-1']);
    // No material was needed: the library is unchanged.
    expect(edit.next.materials).toBe(project.materials);
  });

  it('duplicates a scheme under a new id and name right after it, and removes one with its preference', async () => {
    const { wrapper, lastEdit } = setup(StrengtheningEditor);
    await wrapper.get('[data-testid=duplicate-scheme-0]').trigger('click');
    const copy = lastEdit().member.schemes!;
    expect(copy.map((s) => s.id)).toEqual(['cfrp-2', 'frp-1', 'overlay-3']);
    expect(copy[1]!.name).not.toBe(copy[0]!.name);
    await wrapper.setProps({ member: { ...member, preferredSchemeId: 'overlay-3' } });
    await wrapper.get('[data-testid=remove-scheme-1]').trigger('click');
    const removed = lastEdit().member;
    expect(removed.schemes!.map((s) => s.id)).toEqual(['cfrp-2']);
  });

  it('removing the preferred scheme clears the preference; the last scheme removed leaves no list', () => {
    const marked = setMemberField(project, 'B-204', ['preferredSchemeId'], 'overlay-3');
    const after = removeScheme(marked, 'B-204', 1).members.find((m) => m.id === 'B-204')!;
    expect(after.preferredSchemeId).toBeUndefined();
    const none = removeScheme(removeScheme(project, 'B-204', 1), 'B-204', 0).members.find((m) => m.id === 'B-204')!;
    expect(none.schemes).toBeUndefined();
  });

  it('a scheme that needs a material the project lacks adds one to the library, named to be confirmed', () => {
    const withoutFrp = { ...project, materials: project.materials.filter((m) => m.kind !== 'frp'), members: project.members.map((m) => (m.id === 'B-204' ? { ...m, schemes: [] } : m)) };
    const out = addScheme(withoutFrp, 'B-204', 'frp');
    expect(out.addedMaterial).toMatchObject({ kind: 'frp', environmentalFactor: 0.95 });
    expect(out.addedMaterial!.name).toContain('confirm');
    expect(out.project.materials).toHaveLength(withoutFrp.materials.length + 1);
    expect(out.scheme).toMatchObject({ kind: 'frp', frpId: out.addedMaterial!.id });
  });

  it('marks a preferred scheme', async () => {
    const { wrapper, lastEdit } = setup(StrengtheningEditor);
    await wrapper.get('[data-testid=preferred-scheme]').setValue('overlay-3');
    expect(lastEdit().label).toBe('Mark preferred scheme');
    expect(lastEdit().member.preferredSchemeId).toBe('overlay-3');
  });
});

describe('ComparisonPanel', () => {
  it('draws every variant on the same moment–curvature and load–deflection axes', () => {
    const { wrapper } = setup(ComparisonPanel, { result, system: 'us', codeBasis: 'ACI 318-19' });
    for (const id of ['chart-comparison-mc', 'chart-comparison-ld']) {
      expect(wrapper.get(`[data-testid=${id}]`).attributes('data-series')).toBe(`design beam|as found|${member.schemes![0]!.name}|${member.schemes![1]!.name}`);
    }
  });

  it('tables each variant\'s results and the strengthening checks, pass or fail', () => {
    const { wrapper } = setup(ComparisonPanel, { result, system: 'us', codeBasis: 'ACI 318-19' });
    const table = wrapper.get('[data-testid=comparison-table]');
    const strength = table.get('[data-row=strength]').findAll('td').map((td) => td.text());
    expect(strength.slice(1)).toEqual([result.retrofit!.original!, result.retrofit!.asFound!.variant!, ...result.retrofit!.schemes.map((s) => s.variant!)].map((v) => v.strength!.utilisation.toFixed(2)));
    const steel = table.get('[data-row=check-steel-service-stress]').text();
    expect(steel).toMatch(/passes|fails/);
    expect(steel).toContain('ACI 440.2R-17');
    expect(wrapper.get(`[data-testid=statement-overlay-3]`).text()).toContain('design moment +');
  });
});

describe('ShearPanel and ServicePanel', () => {
  it('shear: the diagram, what fails first and the governing factored point, from the results', () => {
    const { wrapper } = setup(ShearPanel, { result, system: 'us' });
    expect(wrapper.get('[data-testid=chart-shear]').attributes('data-series')).toContain('factored demand');
    expect(wrapper.get('[data-testid=shear-governs]').text()).toMatch(result.shear!.governs === 'shear' ? /^shear/ : /^flexure/);
    expect(wrapper.text()).toContain(`${result.shear!.factored!.utilisation.toFixed(2)} passes`);
  });

  it('service: deflection by load step for both methods, with a limit line per check', () => {
    const { wrapper } = setup(ServicePanel, { result, system: 'us', durationMonths: 60 });
    const series = wrapper.get('[data-testid=chart-service]').attributes('data-series')!.split('|');
    expect(series[0]).toContain('integration');
    expect(series[1]).toContain('code method');
    expect(series.filter((s) => s.startsWith('limit ℓ/'))).toHaveLength(result.service!.checks.length);
  });
});
