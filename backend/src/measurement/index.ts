export * from './measurement-issue';
export * from './decode-photo';
export * from './measure-photo';
export * from './read-window';
export * from './render-overlay';
export * from './measurement.service';
