// Native platforms draw their own focus indication; only the web needs a ring (focus-ring.web.ts).
export {};
