import { Icons, type IconName, type IconPaths, type IconSize } from '@blueprintjs/icons';

// Blueprint draws an icon named by a string (`icon="add"`) from SVG paths it loads on first use. Its
// default loader fetches every icon's paths at once (two chunks of 100 kB compressed); the icons
// Friable shows are built in here instead (a few kB), in both sizes. An icon not listed still shows,
// through Blueprint's own loader. icons.test.ts fails, naming the file, for an icon used in the
// source but missing here: add its name to the list in braces.
const shapes = import.meta.glob<IconPaths>(
  '../../../../node_modules/@blueprintjs/icons/lib/esm/generated/*px/paths/{add,archive,arrow-left,calculator,calendar,camera,changes,chevron-down,chevron-up,clipboard,cloud-upload,comment,disable,document,download,edit,endorsed,envelope,error,eye-open,filter-remove,floppy-disk,git-merge,grid,grid-view,history,info-sign,lab-test,label,layout-grid,lightbulb,lock,log-out,map-marker,media,path-search,people,person,play,print,properties,random,refresh,remove,search-template,shield,shopping-cart,stop,stopwatch,swap-horizontal,th,tick,tick-circle,timeline-line-chart,undo,unlock,warning-sign}.js',
  { eager: true, import: 'default' },
);

/** Paths by "size:name", e.g. "16:add". */
const known = new Map(
  Object.entries(shapes).map(([file, paths]) => {
    const [, size, name] = /\/(16|20)px\/paths\/([a-z0-9-]+)\.js$/.exec(file) ?? [];
    return [`${size}:${name}`, paths];
  }),
);

/** The icon names built in (each in 16 and 20 px). */
export const builtInIcons: ReadonlySet<string> = new Set([...known.keys()].map((key) => key.split(':')[1]));

async function loadIcon(name: IconName, size: IconSize): Promise<IconPaths> {
  const paths = known.get(`${size}:${name}`);
  if (paths) return paths;
  const { splitPathsBySizeLoader } = await import('@blueprintjs/icons/lib/esm/paths-loaders/splitPathsBySizeLoader');
  return splitPathsBySizeLoader(name, size);
}

/** Called once before the app renders. */
export function configureIcons(): void {
  Icons.setLoaderOptions({ loader: loadIcon });
}
