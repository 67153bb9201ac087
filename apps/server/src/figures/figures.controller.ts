/** GET /api/figures: which figures each specification kind reports, with units (signed-in members). */
import { Controller, Get } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { FIGURE_CATALOGUE, figureCatalogueAnswerSchema, type FigureCatalogueAnswer, VERDICT_FIGURES } from '@hexloom/contracts';
import { openApiSchema } from '../common/openapi-schema.js';

@ApiTags('figures')
@Controller('figures')
export class FiguresController {
  @Get()
  @ApiOperation({ summary: 'The figures each kind of specification reports for its outputs, with units, and the verdict figures saved for every circuit' })
  @ApiOkResponse({ schema: openApiSchema(figureCatalogueAnswerSchema) })
  catalogue(): FigureCatalogueAnswer {
    return { kinds: FIGURE_CATALOGUE, verdict: VERDICT_FIGURES };
  }
}
