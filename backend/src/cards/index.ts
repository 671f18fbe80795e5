export * from './card-layout.types';
export * from './card-kinds';
export * from './card-layout';
export * from './card-payload';
export * from './card-id';
export * from './render-card-png';
export * from './render-card-pdf';
export * from './cards.service';
