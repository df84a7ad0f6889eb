import { defaultCatalogue } from '../src/domain/catalogue';
for (const v of defaultCatalogue.variants) console.log(v.id, v.sectionProperties.area.toFixed(0), (v.sectionProperties.ix/1e4).toFixed(2), (v.sectionProperties.iy/1e4).toFixed(2), v.massPerMetre.toFixed(3), v.propertiesSource);
