import { analyzeDesign } from '../src/domain/analyze';
import { demoDesignBuilders } from '../src/domain/fixtures/demoDesigns';
import { parseDesignOrThrow } from '../src/domain/design/parse';
for (const [file, build] of Object.entries(demoDesignBuilders)) {
  const a = analyzeDesign(parseDesignOrThrow(JSON.parse(JSON.stringify(build()))));
  console.log(file, a.counts, 'mass', a.mass.total.toFixed(1));
  for (const f of a.findings.filter((f) => f.severity !== 'note' || f.check === 'structure')) console.log('  ', f.severity, f.id, '|', f.message.slice(0, 260));
  for (const r of a.structure) console.log('   joints', r.joints.map((j) => `${j.jointId}:${j.reaction}/${j.allowable}`).join(' '), 'panels', JSON.stringify(r.panels));
}
