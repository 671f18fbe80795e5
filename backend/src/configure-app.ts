import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import helmet from 'helmet';

/**
 * Everything `main.ts` sets on the app besides the module tree, shared with the e2e tests so
 * that they exercise the same server: `/api` prefix, security headers, cookies, shutdown hooks.
 */
export function configureApp(app: INestApplication): INestApplication {
  app.setGlobalPrefix('api');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // MUI (Emotion) injects <style> elements; images may be photos shown from blob: URLs.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          'upgrade-insecure-requests': null,
        },
      },
      // The app is served over plain http on 127.0.0.1 in development.
      hsts: false,
    }),
  );
  app.use(cookieParser());
  app.enableShutdownHooks();
  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Mixmark API')
      .setDescription(
        'Colour-mixing drills graded from photos. Every error has the shape { statusCode, code, message, details? }. ' +
          'Sign in at POST /api/auth/sign-in; send the access token as a Bearer token; POST /api/auth/refresh renews it from the httpOnly cookie.',
      )
      .setVersion(process.env.npm_package_version ?? '0.1.0')
      .addBearerAuth()
      .build(),
  );
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs/openapi.json' });
  return app;
}
