import helmet from 'helmet';

/**
 * Security headers. The CSP admits only this origin: the built UI's scripts, styles and fonts,
 * images incl. data: (inline icons) and blob: (previews), and blob: frames/objects for the PDF
 * preview. Mantine writes style attributes and a style tag at run time, hence 'unsafe-inline'
 * for styles only; scripts stay strictly 'self'.
 */
export function securityHeaders() {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        baseUri: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        fontSrc: ["'self'", 'data:'],
        imgSrc: ["'self'", 'data:', 'blob:'],
        connectSrc: ["'self'"],
        frameSrc: ["'self'", 'blob:'],
        objectSrc: ["'self'", 'blob:'],
        workerSrc: ["'self'", 'blob:'],
        formAction: ["'self'"],
        frameAncestors: ["'self'"],
      },
    },
    crossOriginEmbedderPolicy: false,
  });
}
