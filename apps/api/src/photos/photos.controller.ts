import { Controller, Delete, Get, Header, HttpCode, Param, ParseIntPipe, Put, StreamableFile, UploadedFile, UseInterceptors } from '@nestjs/common';
import { ApiBody, ApiConflictResponse, ApiConsumes, ApiNoContentResponse, ApiOkResponse, ApiPayloadTooLargeResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { DOWNLOAD_POLICY } from '../common/security/security-headers';
import { SingleFileUpload } from '../storage/single-file-upload.interceptor';
import { photosConfig } from './photos.config';
import { PhotosService } from './photos.service';
import { PlotPhotoDto } from './dto/plot-photo.dto';
import { ApiFileResponse } from '../common/openapi/file-response.decorator';

@ApiTags('photos')
@Controller('trials/:trialId/plots/:plotId/rounds/:roundId/photo')
export class PhotosController {
  constructor(private readonly photos: PhotosService) {}

  @Get()
  @AnyTrialMember()
  // A photo is someone's upload: served as a download under a sandbox, never sniffed, so bytes
  // hidden after the image (a script, say) cannot run in Friable's origin.
  @Header('Content-Security-Policy', DOWNLOAD_POLICY)
  @ApiFileResponse(['image/jpeg', 'image/png'], 'The image (image/jpeg or image/png), as an attachment named after the plot and round.')
  async get(@CurrentTrialAccess() access: TrialAccessContext, @Param('plotId', ParseIntPipe) plotId: number, @Param('roundId', ParseIntPipe) roundId: number) {
    const { photo, bytes } = await this.photos.get(access.trialId, plotId, roundId);
    const fileName = await this.photos.downloadName(access.trialId, plotId, roundId, photo);
    return new StreamableFile(bytes, { type: photo.contentType, length: bytes.length, disposition: `attachment; filename="${fileName}"` });
  }

  @Put()
  @TrialAccess('investigator', 'collaborator')
  @UseInterceptors(SingleFileUpload({ field: 'file', configToken: photosConfig.KEY, what: 'a photo' }))
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', required: ['file'], properties: { file: { type: 'string', format: 'binary', description: 'A JPEG or PNG image.' } } } })
  @ApiOkResponse({ type: PlotPhotoDto, description: 'PlotPhoto: the photo kept (its type as found in the bytes).' })
  @ApiUnprocessableEntityResponse({ description: 'The file is not a JPEG or PNG image (checked from its content).' })
  @ApiPayloadTooLargeResponse({ description: 'The photo is larger than PHOTO_MAX_BYTES (8 MB by default).' })
  @ApiConflictResponse({ description: 'The trial is locked.' })
  put(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('plotId', ParseIntPipe) plotId: number,
    @Param('roundId', ParseIntPipe) roundId: number,
    @UploadedFile() file: Express.Multer.File | undefined,
  ) {
    return this.photos.put(access, user, plotId, roundId, file?.buffer);
  }

  @Delete()
  @HttpCode(204)
  @TrialAccess('investigator', 'collaborator')
  @ApiNoContentResponse({ description: 'The photo was removed.' })
  @ApiConflictResponse({ description: 'The trial is locked.' })
  remove(
    @CurrentTrialAccess() access: TrialAccessContext,
    @CurrentUser() user: AuthUser,
    @Param('plotId', ParseIntPipe) plotId: number,
    @Param('roundId', ParseIntPipe) roundId: number,
  ) {
    return this.photos.remove(access, user, plotId, roundId);
  }
}
