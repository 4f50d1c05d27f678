import { chromium } from 'playwright-core';
const [,, file, y, h, out, w = '390'] = process.argv;
const b = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox'] });
const p = await b.newPage({ viewport: { width: Number(w), height: Number(h) } });
await p.setContent(`<body style="margin:0"><img src="data:image/png;base64,${(await import('node:fs')).readFileSync(file).toString('base64')}" style="display:block;margin-top:-${y}px"></body>`);
await p.screenshot({ path: out });
await b.close();
